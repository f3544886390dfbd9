/**
 * Command line: tree-level matching when heavy fields are integrated out.
 *   npm run --silent match -- UV.json --heavy NAME[,NAME...] --max-dim N
 * Prints only JSON on stdout:
 *   {"child": theory file, "tree": true, "convention", "orderZero", "coefficients":
 *    [{"dimension", "class", "text", "latex", "coefficient", "orderZeroChange"}], "notComputed": [...]}
 * `coefficient` is a nerdamer-parsable expression in the coupling and mass symbols of the
 * theory file; an order-0 coefficient is the CHANGE of that coupling (not the new total).
 * This version matches one heavy real singlet scalar at order 0 (server/engine/matching/
 * treeScalarExchange.ts); what it does not compute is listed in "notComputed".
 * Errors: message on stderr, exit code 2, nothing on stdout.
 */
import { existsSync, readFileSync } from 'node:fs'
import { parseTheory } from '../server/engine/theory/parseTheory'
import { matchHeavyScalar } from '../server/engine/matching/treeScalarExchange'

class UsageError extends Error {}

const USAGE = 'usage: match UV.json --heavy NAME[,NAME...] --max-dim N'

function parseArgs(argv: string[]): { source: string; heavy: string[]; maxDim: number } {
  let source: string | undefined
  let heavy: string[] | undefined
  let maxDim: number | undefined
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i]!
    if (a === '--heavy')
      heavy = (argv[++i] ?? '')
        .split(',')
        .map((s) => s.trim())
        .filter(Boolean)
    else if (a === '--max-dim') {
      const v = argv[++i]
      if (v === undefined || !/^\d+$/.test(v) || Number(v) < 4) throw new UsageError(`--max-dim needs a whole number of at least 4, got ${v ?? 'nothing'}\n${USAGE}`)
      maxDim = Number(v)
    } else if (a.startsWith('--')) throw new UsageError(`unknown option ${a}\n${USAGE}`)
    else if (source === undefined) source = a
    else throw new UsageError(`more than one theory given: ${source} and ${a}\n${USAGE}`)
  }
  if (source === undefined) throw new UsageError(`no theory file given\n${USAGE}`)
  if (!heavy?.length) throw new UsageError(`--heavy NAME is required: the field to integrate out\n${USAGE}`)
  if (maxDim === undefined) throw new UsageError(`--max-dim N is required\n${USAGE}`)
  if (heavy.length > 1) throw new UsageError(`this version integrates out one heavy real scalar at a time; got ${heavy.join(', ')}`)
  if (!existsSync(source)) throw new UsageError(`no such theory file: ${source}`)
  return { source, heavy, maxDim }
}

function main(): void {
  try {
    const args = parseArgs(process.argv.slice(2))
    const result = matchHeavyScalar(parseTheory(readFileSync(args.source, 'utf8')), args.heavy[0]!)
    const out = {
      child: result.child,
      tree: true,
      convention: result.assumptions,
      orderZero: 'coefficients of order-0 operators (dimension 4) are changes of those couplings, not new totals',
      coefficients: result.shifts.map((s) => ({ dimension: 4, class: s.classKey, text: s.operator, latex: s.latex, coefficient: s.coefficient, orderZeroChange: true })),
      notComputed: args.maxDim > 4 ? result.notComputed : result.notComputed.filter((n) => !n.startsWith('classes with derivatives')),
    }
    process.stdout.write(`${JSON.stringify(out)}\n`)
  } catch (e) {
    process.stderr.write(`match: ${(e as Error).message}\n`)
    process.exitCode = 2
  }
}

main()
