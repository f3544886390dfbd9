/**
 * Explicit operator basis from the command line.
 *   node --import tsx scripts/basis.ts THEORY.json --max-dim N [--min-dim M] [--nf K]
 *   npm run --silent basis -- THEORY.json --max-order N   (order = dimension − 4; heavy frame: power of 1/m)
 * With --max-order the result is {"theory","byOrder":[{"order","operators","classes":[…]}],"orderZero"}, where
 * orderZero is the renormalizable Lagrangian: {"note","realParameters","flavorParameters","classes":[{"key",
 * "role","dimension","rank","realParameters","flavorParameters","operators":[{"text","latex","hermitian","realParameters"}]}]}; a
 * heavy-frame theory needs --max-order and lists each class's operators (text, LaTeX, real parameters).
 * Prints only JSON: {"theory","note","byDimension":[{"dimension","operators" (real
 * parameters),"tallyOk","classes":[{"key","conjugateKey","rank","hilbert","tallyOk",
 * "message"?,"cpEven","cpOdd","operators":[{"text","latex","latex4","cp" ("even", "odd", or "both" for a
 * non-Hermitian operator: one CP-even and one CP-odd parameter),"hermitian","realParameters","flavorComponents",…}]}]}]}.
 * With flavors (--nf > 1 or "flavors" in the theory) a class lists one operator per
 * (structure, Young symmetry) pair with its number of flavor components; "youngConvention" says
 * which Young symmetrizer a shape means (flavor.ts, YOUNG_CONVENTION).
 * Exit code 1 with a message on stderr for bad input.
 */
import { readFileSync } from 'node:fs'
import { parseTheory } from '../server/engine/theory/parseTheory'
import { buildBasis, type ClassReport } from '../server/engine/basis/index'
import { massRatioDimension } from '../server/engine/rules/defaultWeights'
import { heavyOutput } from './heavyCli'
import type { OrderZeroReport } from '../server/engine/basis/orderZero'
import { goldstoneCli } from './lib/goldstoneCli'

function usage(msg: string): never {
  process.stderr.write(`basis: ${msg}\nusage: node --import tsx scripts/basis.ts THEORY.json (--max-dim N [--min-dim M] | --max-order N) [--nf K]\n`)
  process.exit(1)
}

function intArg(args: string[], name: string): number | undefined {
  const i = args.indexOf(name)
  if (i < 0) return undefined
  const v = args[i + 1]
  if (v === undefined || !/^\d+$/.test(v)) usage(`${name} needs a positive integer, got ${v ?? 'nothing'}`)
  return Number(v)
}

function classJson(c: ClassReport) {
  const base = {
    key: c.key,
    conjugateKey: c.conjugateKey,
    selfConjugate: c.selfConjugate,
    rank: c.rank,
    hilbert: c.hilbert,
    tallyOk: c.tallyOk,
    ...(c.message ? { message: c.message } : {}),
    cpEven: c.cpEven,
    cpOdd: c.cpOdd,
  }
  if (c.flavor) {
    return {
      ...base,
      youngConvention: c.flavor.convention,
      flavorCount: c.flavor.count,
      flavorHilbert: c.flavor.hilbert,
      realParameters: c.flavor.realParameters,
      operators: c.flavor.operators.map((o) => ({ text: o.text, latex: o.latex, latex4: o.latex4, hermitian: c.selfConjugate, young: o.young, flavorComponents: o.flavorComponents })),
    }
  }
  return {
    ...base,
    realParameters: c.realParameters,
    operators: c.operators.map((o) => ({
      text: o.text,
      latex: o.latex,
      latex4: o.latex4,
      cp: o.cp,
      hermitian: o.hermitian,
      realParameters: o.realParameters,
      flavorComponents: o.flavorComponents,
      fields: o.fields,
      derivatives: o.derivatives,
    })),
  }
}

function orderZeroJson(z: OrderZeroReport) {
  return {
    note: z.note,
    realParameters: z.realParameters,
    flavorParameters: z.flavorParameters,
    classes: z.classes.map((c) => ({
      key: c.key,
      role: c.role,
      dimension: c.dimension,
      rank: c.rank,
      realParameters: c.realParameters,
      flavorParameters: c.flavorParameters,
      operators: c.operators.map((o) => ({ text: o.text, latex: o.latex, hermitian: o.hermitian, realParameters: o.realParameters })),
    })),
  }
}

function main(): void {
  if (goldstoneCli('basis', process.argv.slice(2))) return
  const args = process.argv.slice(2)
  const file = args.find((a, i) => !a.startsWith('--') && (i === 0 || !args[i - 1]!.startsWith('--')))
  if (!file) usage('missing THEORY.json')
  const maxDimArg = intArg(args, '--max-dim')
  const maxOrder = intArg(args, '--max-order')
  if (maxDimArg === undefined && maxOrder === undefined) usage('missing --max-dim or --max-order')
  if (maxDimArg !== undefined && maxOrder !== undefined) usage('give --max-dim or --max-order, not both')
  let text: string
  try {
    text = readFileSync(file, 'utf8')
  } catch (e) {
    usage(`cannot read ${file}: ${(e as Error).message}`)
  }
  try {
    const theory = parseTheory(text)
    if (theory.frame === 'heavy') {
      if (maxOrder === undefined) usage('a heavy-frame theory is enumerated in orders of 1/m: use --max-order N (1 to 4)')
      process.stdout.write(`${JSON.stringify(heavyOutput(theory, maxOrder, true), null, 2)}\n`)
      return
    }
    const maxDim = maxDimArg ?? massRatioDimension(maxOrder!)
    const r = buildBasis(theory, { maxDim, minDim: intArg(args, '--min-dim'), nf: intArg(args, '--nf'), orderZero: maxOrder !== undefined })
    const entry = (d: (typeof r.byDimension)[number]) => ({ operators: d.operators, tallyOk: d.tallyOk, ...(d.message ? { message: d.message } : {}), classes: d.classes.map(classJson) })
    const out = {
      theory: r.theory,
      note: r.note,
      ...(r.nf ? { nf: r.nf } : {}),
      ...(maxOrder === undefined
        ? { byDimension: r.byDimension.map((d) => ({ dimension: d.dimension, ...entry(d) })) }
        : { byOrder: r.byDimension.map((d) => ({ order: d.order, dimension: d.dimension, ...entry(d) })), orderZero: orderZeroJson(r.orderZero!) }),
    }
    process.stdout.write(`${JSON.stringify(out, null, 2)}\n`)
  } catch (e) {
    process.stderr.write(`basis: ${(e as Error).message}\n`)
    process.exit(1)
  }
}

main()
