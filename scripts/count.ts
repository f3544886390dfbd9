/**
 * Command line: count the independent operators of a theory, per mass dimension and class.
 *   npm run --silent count -- THEORY.json --max-dim N [--min-dim M] [--nf K]
 *   npm run --silent count -- THEORY.json --max-order N    (order = dimension − 4; heavy frame: power of 1/m)
 * THEORY.json may also be a preset id (e.g. `smeft`). Prints only JSON on stdout:
 *   {"theory": "…", "byDimension": [{"dimension": d, "operators": n, "classes": {"<key>": n},
 *    "cpEven": e, "cpOdd": o, "cp": {"<key>": {"even": e, "odd": o, "conjugate"?: "<key>"}}}],
 *    "cpConvention": "…"}  (or "cpUnavailable": "why", and no cp fields, where CP is not counted)
 *   with --max-order: {"theory", "byOrder": [{"order", "operators", "classes": [{"key", "count", …}]}]}
 *   (a heavy-frame theory enumerates its operators, so its classes also give real parameters).
 * --nf K overrides the flavor number of every field that declares "flavors".
 * Errors: message on stderr, exit code 2, nothing on stdout.
 */
import { existsSync, readFileSync } from 'node:fs'
import { findPreset } from '../shared/presets/index'
import type { Theory } from '../shared/schemas/theory'
import { parseTheory } from '../server/engine/theory/parseTheory'
import { countOperators } from '../server/engine/counting/countOperators'
import { massRatioDimension, massRatioOrder } from '../server/engine/rules/defaultWeights'
import { heavyOutput } from './heavyCli'
import { goldstoneCli } from './lib/goldstoneCli'

class UsageError extends Error {}

const USAGE = 'usage: count THEORY.json|PRESET (--max-dim N [--min-dim M] | --max-order N) [--nf K]'

function parseArgs(argv: string[]): { source: string; maxDim?: number; maxOrder?: number; minDim?: number; nf?: number } {
  let source: string | undefined
  const opts: Record<string, number> = {}
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!
    if (a === '--max-dim' || a === '--min-dim' || a === '--nf' || a === '--max-order') {
      const v = argv[++i]
      if (v === undefined || !/^\d+$/.test(v)) throw new UsageError(`${a} needs a positive integer, got ${v ?? 'nothing'}\n${USAGE}`)
      opts[a] = Number(v)
    } else if (a.startsWith('--')) {
      throw new UsageError(`unknown option ${a}\n${USAGE}`)
    } else if (source === undefined) {
      source = a
    } else {
      throw new UsageError(`more than one theory given: ${source} and ${a}\n${USAGE}`)
    }
  }
  if (source === undefined) throw new UsageError(`no theory file given\n${USAGE}`)
  if (opts['--max-dim'] === undefined && opts['--max-order'] === undefined) throw new UsageError(`--max-dim or --max-order is required\n${USAGE}`)
  if (opts['--max-dim'] !== undefined && opts['--max-order'] !== undefined) throw new UsageError(`give --max-dim or --max-order, not both\n${USAGE}`)
  return { source, maxDim: opts['--max-dim'], maxOrder: opts['--max-order'], minDim: opts['--min-dim'], nf: opts['--nf'] }
}

function loadTheory(source: string): Theory {
  if (existsSync(source)) return parseTheory(readFileSync(source, 'utf8'))
  const preset = findPreset(source)
  if (preset) return parseTheory(preset.theory)
  throw new UsageError(`no such theory file or preset: ${source}`)
}

function main(): void {
  if (goldstoneCli('count', process.argv.slice(2))) return
  try {
    const args = parseArgs(process.argv.slice(2))
    const theory = loadTheory(args.source)
    if (theory.frame === 'heavy') {
      if (args.maxOrder === undefined) throw new UsageError('a heavy-frame theory is counted in orders of 1/m: use --max-order N (1 to 4)')
      process.stdout.write(`${JSON.stringify(heavyOutput(theory, args.maxOrder, false))}\n`)
      return
    }
    const maxDim = args.maxDim ?? massRatioDimension(args.maxOrder!)
    const result = countOperators(theory, { maxDim, minDim: args.minDim, nf: args.nf })
    const plain =
      args.maxOrder === undefined
        ? {
            theory: result.theory,
            byDimension: result.byDimension.map((d) => ({
              dimension: d.dimension,
              operators: d.operators,
              classes: d.classes,
              ...(d.cp ? { cpEven: d.cpEven, cpOdd: d.cpOdd, cp: d.cp } : {}),
            })),
            ...(result.cpConvention ? { cpConvention: result.cpConvention } : { cpUnavailable: result.cpUnavailable }),
          }
        : {
            theory: result.theory,
            byOrder: result.byDimension.map((d) => ({
              order: massRatioOrder(d.dimension),
              dimension: d.dimension,
              operators: d.operators,
              classes: Object.entries(d.classes).map(([key, count]) => ({ key, count })),
            })),
          }
    process.stdout.write(`${JSON.stringify(plain)}\n`)
  } catch (e) {
    process.stderr.write(`count: ${(e as Error).message}\n`)
    process.exitCode = 2
  }
}

main()
