/**
 * The light fields of a heavy-frame theory as the heavy–light sector sees them: light Dirac
 * fermions (a left- and a right-handed Weyl field of the roster with identical charges,
 * representations and flavors), complex scalars and real scalars, with their gauge and global
 * quantum numbers. Field strengths are not light matter here (they enter through E and B).
 */
import { parseRational, isZero, add, neg, type Rational, ZERO } from '../exact/rational'
import { fieldTex } from './fieldTex'
import type { LorentzKind } from '../../../shared/schemas/lorentzKind'

export interface TheoryGroupLike {
  name: string
  type: string
  n?: number
  gauge?: boolean
}
export interface TheoryFieldLike {
  name: string
  lorentz: LorentzKind
  reps?: Record<string, number[] | string>
  charges?: Record<string, string | number>
  real?: boolean
  flavors?: number
  gaugeOf?: string
}

export type LightKind = 'dirac' | 'complexScalar' | 'realScalar'

export interface LightField {
  name: string
  kind: LightKind
  /** Twice the mass dimension (Dirac 3, scalar 2). */
  dim2: number
  tex: string
  reps: Record<string, number[]>
  charges: Record<string, string | number>
  /** The roster fields it is made of (a Dirac fermion: its left- and right-handed parts). */
  parts: string[]
}

/** The heavy–light sector's name of a roster field's Lorentz kind (shared/schemas/lorentzKind.ts). */
export function lorentzKind(f: { lorentz: LorentzKind }): 'scalar' | 'left' | 'right' | 'strength' {
  const l = f.lorentz
  if (l === 'scalar') return 'scalar'
  if (l === 'left-weyl') return 'left'
  if (l === 'right-weyl') return 'right'
  return 'strength'
}

function sameQuantumNumbers(a: TheoryFieldLike, b: TheoryFieldLike, groups: readonly TheoryGroupLike[]): boolean {
  for (const g of groups) {
    if (g.type === 'SU') {
      const ra = dynkinReps(a.reps)[g.name] ?? []
      const rb = dynkinReps(b.reps)[g.name] ?? []
      if (ra.some((x) => x !== 0) || rb.some((x) => x !== 0)) {
        if (ra.join(',') !== rb.join(',')) return false
      }
    } else if (!equalCharge(a.charges?.[g.name], b.charges?.[g.name], g)) return false
  }
  return (a.flavors ?? 1) === (b.flavors ?? 1)
}

function equalCharge(x: string | number | undefined, y: string | number | undefined, g: TheoryGroupLike): boolean {
  const qx = parseRational(String(x ?? 0).replace(/\s+/g, ''))
  const qy = parseRational(String(y ?? 0).replace(/\s+/g, ''))
  const d = add(qx, neg(qy))
  if (g.type === 'Z') return Number(d.num) % (g.n ?? 1) === 0
  return isZero(d)
}

function diracName(l: string, r: string): string {
  const stem = (s: string, end: string) => (s.length > 1 && s.endsWith(end) ? s.slice(0, -1) : null)
  const sl = stem(l, 'L')
  return sl !== null && sl === stem(r, 'R') ? sl : `${l}${r}`
}

/**
 * Light matter of the roster: Dirac pairs, scalars, and the Weyl fields left without a partner
 * of opposite chirality (their heavy–light operators need P and T of a Dirac fermion and are
 * not enumerated; the caller says so).
 * @example lightFields(qedWithElectron).fields // [{ name: 'e', kind: 'dirac', parts: ['eL', 'eR'] }]
 */
export function lightFields(fields: readonly TheoryFieldLike[], groups: readonly TheoryGroupLike[]): { fields: LightField[]; unpaired: string[] } {
  const out: LightField[] = []
  const rights = fields.filter((f) => lorentzKind(f) === 'right')
  const used = new Set<string>()
  const unpaired: string[] = []
  for (const f of fields) {
    const kind = lorentzKind(f)
    if (kind === 'scalar') {
      out.push({ name: f.name, kind: f.real ? 'realScalar' : 'complexScalar', dim2: 2, tex: fieldTex(f.name), reps: dynkinReps(f.reps), charges: f.charges ?? {}, parts: [f.name] })
    } else if (kind === 'left') {
      const r = rights.find((x) => !used.has(x.name) && sameQuantumNumbers(f, x, groups))
      if (!r) {
        unpaired.push(f.name)
        continue
      }
      used.add(r.name)
      const name = diracName(f.name, r.name)
      out.push({ name, kind: 'dirac', dim2: 3, tex: fieldTex(name), reps: dynkinReps(f.reps), charges: f.charges ?? {}, parts: [f.name, r.name] })
    }
  }
  for (const r of rights) if (!used.has(r.name)) unpaired.push(r.name)
  return { fields: out, unpaired }
}

/** U(1) or Z_n charge of a field as a rational (absent = 0). */
export function chargeOf(f: { charges?: Record<string, string | number> }, group: string): Rational {
  const q = f.charges?.[group]
  return q === undefined ? ZERO : parseRational(String(q).replace(/\s+/g, ''))
}

/** Dynkin labels per Lie group (finite flavour groups, named by irrep, do not enter the heavy frame's light content). */
function dynkinReps(reps: Record<string, number[] | string> | undefined): Record<string, number[]> {
  return Object.fromEntries(Object.entries(reps ?? {}).filter((e): e is [string, number[]] => typeof e[1] !== 'string'))
}
