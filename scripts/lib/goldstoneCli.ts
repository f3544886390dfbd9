/**
 * The Goldstone-frame branch of `npm run count` and `npm run basis`:
 *   npm run --silent count -- THEORY.json --max-order 8
 *   npm run --silent basis -- THEORY.json --max-order 6
 * THEORY.json may be a preset id. Prints only JSON on stdout:
 *   {"theory", "coset", "byOrder": [{"order" (power of p), "operators" (C- and P-even terms, both
 *   intrinsic parities), "byParity": {"even", "odd"}, "contact", "classes": [...]}]}
 * (basis: each class lists its kept operators; "alternatives" holds set-aside operators with their
 * exact rewrites). Returns false when the theory is not in the Goldstone frame (or cannot be
 * read), so that the caller's own path handles it.
 */
import { existsSync, readFileSync } from 'node:fs'
import { findPreset } from '../../shared/presets/index'
import { TheorySchema, type Theory } from '../../shared/schemas/theory'
import { countGoldstone } from '../../server/engine/goldstone/countGoldstone'
import { goldstoneBasis } from '../../server/engine/goldstone/explicit/goldstoneBasis'

function readTheory(source: string | undefined): Theory | null {
  if (!source) return null
  let input: unknown
  try {
    input = existsSync(source) ? JSON.parse(readFileSync(source, 'utf8')) : findPreset(source)?.theory
  } catch {
    return null
  }
  const parsed = TheorySchema.safeParse(input)
  return parsed.success ? parsed.data : null
}

function orderArg(argv: string[], name: string): number | undefined {
  const i = argv.indexOf(name)
  if (i < 0) return undefined
  const v = argv[i + 1]
  if (v === undefined || !/^\d+$/.test(v)) throw new Error(`${name} needs a whole number (a power of p), got ${v ?? 'nothing'}`)
  return Number(v)
}

/** Handle a Goldstone-frame theory; false when it is not one. */
export function goldstoneCli(kind: 'count' | 'basis', argv: string[]): boolean {
  const source = argv.find((a, i) => !a.startsWith('--') && (i === 0 || !argv[i - 1]!.startsWith('--')))
  const theory = readTheory(source)
  if (!theory || theory.frame !== 'goldstone' || !theory.goldstone) return false
  try {
    const g = theory.goldstone
    const maxOrder = orderArg(argv, '--max-order') ?? g.maxOrder
    const minOrder = orderArg(argv, '--min-order')
    const common = { N: g.N, sources: g.sources, maxOrder, ...(minOrder !== undefined ? { minOrder } : {}) }
    const out = kind === 'count' ? countJson(theory.name, g, common) : basisJson(theory.name, common, g.coset)
    process.stdout.write(`${JSON.stringify(out, null, kind === 'basis' ? 2 : undefined)}\n`)
  } catch (e) {
    process.stderr.write(`${kind}: ${(e as Error).message}\n`)
    process.exitCode = kind === 'count' ? 2 : 1
  }
  return true
}

type Common = { N: number | 'general'; sources: { scalar: boolean; vector: boolean }; maxOrder: number; minOrder?: number }

function countJson(name: string, g: NonNullable<Theory['goldstone']>, c: Common) {
  const r = countGoldstone({ coset: g.coset, theta: g.theta, ...c })
  return {
    theory: name,
    coset: r.coset,
    byOrder: r.byOrder.map((o) => ({ order: o.order, operators: o.operators, byParity: o.byParity, contact: o.contact, classes: o.classes, sectors: o.sectors })),
  }
}

function basisJson(name: string, c: Common, coset: 'chiral' | 'orthogonal') {
  if (coset !== 'chiral') throw new Error('explicit bases are built for the SU(N)×SU(N)/SU(N) coset; use count for O(N+1)/O(N)')
  const r = goldstoneBasis(c)
  return {
    theory: name,
    coset: r.coset,
    note: r.note,
    evaluatedAtN: r.evaluatedAtN,
    byOrder: r.byOrder.map((o) => ({
      order: o.order,
      operators: o.rank,
      hilbert: o.hilbert,
      tallyOk: o.tallyOk,
      ...(o.message ? { message: o.message } : {}),
      byParity: { even: o.kept.filter((k) => k.parity === 'even').length, odd: o.kept.filter((k) => k.parity === 'odd').length },
      contact: o.contact.kept,
      classes: [...(o.contact.hilbert ? [{ key: 'contact', hilbert: o.contact.hilbert, rank: o.contact.rank, tallyOk: o.contact.rank === o.contact.hilbert }] : []), ...o.classes].map((cl) => ({
        ...cl,
        operators: o.kept.filter((k) => (cl.key === 'contact' ? k.contact : !k.contact && k.classKey === cl.key)).map((k) => ({ text: k.text, latex: k.latex, parity: k.parity })),
      })),
      alternatives: o.alternatives.map((a) => ({ text: a.text, latex: a.latex, classKey: a.classKey, rewrite: a.rewrite })),
    })),
  }
}
