import { describe, expect, it } from 'vitest'
import { buildBasis, classBasis, type ClassReport } from '../../../server/engine/basis/index'
import smeftJson from './fixtures/smeft.json'
import type { Theory } from '../../../shared/schemas/theory'
import katex from 'katex'

const smeft = smeftJson as Theory
const report = buildBasis(smeft, { maxDim: 6 })
const d5 = report.byDimension.find((d) => d.dimension === 5)!
const d6 = report.byDimension.find((d) => d.dimension === 6)!

const QUARKS = new Set(['Q', 'u', 'd'])
function shape(c: ClassReport): { X: number; H: number; psi: number; k: number; baryon: number } {
  const legs = c.operators[0]?.fields ?? []
  const k = Number(/^D\^?(\d*)/.exec(c.key)?.[1] || (c.key.startsWith('D') ? 1 : 0))
  const base = (l: string) => l.replace(/\*$/, '').replace(/_[LR]$/, '')
  return {
    X: legs.filter((l) => /_[LR]$/.test(l)).length,
    H: legs.filter((l) => base(l) === 'H').length,
    psi: legs.filter((l) => ['Q', 'u', 'd', 'L', 'e'].includes(base(l))).length,
    k,
    baryon: legs.reduce((s, l) => s + (QUARKS.has(base(l)) ? (l.endsWith('*') ? -1 : 1) : 0), 0),
  }
}

/**
 * Count in the convention of Grzadkowski, Iskrzynski, Misiak & Rosiek (JHEP 10 (2010) 085):
 * an operator with fermions and its Hermitian conjugate count once ("+ h.c."); bosonic
 * operators are written Hermitian (X and X̃ separately), i.e. real parameters.
 */
function gimrCount(cs: ClassReport[]): number {
  return cs.reduce((s, c) => s + (shape(c).psi === 0 ? c.realParameters : c.rank), 0)
}

describe('SMEFT one flavor (Grzadkowski, Iskrzynski, Misiak, Rosiek, JHEP 10 (2010) 085, arXiv:1008.4884v3)', () => {
  it('dimension 5: a single structure, the Weinberg operator (Weinberg, PRL 43 (1979) 1566)', () => {
    expect(d5.classes.map((c) => [c.key, c.rank])).toEqual([['L^2 H^2', 1]])
    expect(d5.operators).toBe(2)
    expect(d5.tallyOk).toBe(true)
  })
  it('dimension 6: 84 real parameters (Henning, Lu, Melia & Murayama, JHEP 08 (2017) 016), every class tally-checked', () => {
    expect(d6.operators).toBe(84)
    expect(d6.classes.filter((c) => !c.tallyOk).map((c) => c.message)).toEqual([])
    expect(d6.tallyOk).toBe(true)
  })
  it('class totals per type of structure match Table 2 and 3 of Grzadkowski et al.', () => {
    const by = (f: (s: ReturnType<typeof shape>) => boolean) => gimrCount(d6.classes.filter((c) => f(shape(c))))
    expect(by((s) => s.X === 3)).toBe(4) // X^3
    expect(by((s) => s.H === 6)).toBe(1) // H^6
    expect(by((s) => s.H === 4 && s.k === 2)).toBe(2) // H^4 D^2
    expect(by((s) => s.X === 2 && s.H === 2)).toBe(8) // X^2 H^2
    expect(by((s) => s.psi === 2 && s.H === 3)).toBe(3) // ψ^2 H^3
    expect(by((s) => s.psi === 2 && s.X === 1)).toBe(8) // ψ^2 X H
    expect(by((s) => s.psi === 2 && s.H === 2 && s.k === 1)).toBe(8) // ψ^2 H^2 D
    expect(by((s) => s.psi === 4 && s.baryon === 0)).toBe(25) // four-fermion, B conserving
    expect(by((s) => s.psi === 4 && s.baryon !== 0)).toBe(4) // B violating
  })
  it('gauge structures: G_L^3 has f and d candidates, only f survives Bose symmetry (common practice)', () => {
    const b = classBasis(smeft, 'G_L^3')
    expect(b.candidates).toBe(2)
    expect(b.rank).toBe(1)
    // SU(2) W_L^2 H H*: δ^{IJ}-type and ε/f-type contractions, one survives (Grzadkowski et al. Q_HW)
    expect(classBasis(smeft, 'W_L^2 H H*').rank).toBe(1)
    // hypercharge violating classes have no candidate
    expect(classBasis(smeft, 'H^4 H*^2').candidates).toBe(0)
    expect(classBasis(smeft, 'Q u H^3').candidates).toBe(0)
  })
  it('every operator carries LaTeX in two-component notation and the EOM/IBP note', () => {
    const h6 = d6.classes.find((c) => c.key === 'H^3 H*^3')!
    expect(h6.operators[0]!.latex).toBe('H^{i}\\,H^{j}\\,H^{k}\\,{H^{\\dagger}}_{i}\\,{H^{\\dagger}}_{j}\\,{H^{\\dagger}}_{k}')
    expect(h6.operators[0]!.hermitian).toBe(true)
    for (const d of [d5, d6])
      for (const c of d.classes)
        for (const o of c.operators) {
          expect(() => katex.renderToString(o.latex, { throwOnError: true })).not.toThrow()
        }
    expect(report.note).toContain('terms proportional to the equations of motion move into other classes')
  })
})

describe('four-component forms (Dirac bilinears as in Grzadkowski et al., Tables 2–3)', () => {
  const op = (key: string) => d6.classes.find((c) => c.key === key)!.operators
  it('every dimension-6 operator with fermions gets a four-component form that KaTeX renders', () => {
    const withFermions = d6.classes.filter((c) => shape(c).psi > 0).flatMap((c) => c.operators)
    expect(withFermions).toHaveLength(48) // 3 + 8 + 8 + 25 + 4 structures with fermions
    for (const o of withFermions) {
      expect(o.latex4).not.toBeNull()
      expect(() => katex.renderToString(o.latex4!, { throwOnError: true })).not.toThrow()
    }
    for (const o of op('H^3 H*^3')) expect(o.latex4).toBeNull() // no fermions
  })
  it('vector currents (Q_ee, Q_Hl(1)), dipole tensors (Q_eB) and scalar bilinears (Q_eH)', () => {
    expect(op('e^2 e*^2')[0]!.latex4).toBe('({\\bar{e}}\\gamma^{\\mu}{e})\\,({\\bar{e}}\\gamma_{\\mu}{e})')
    expect(op('D L L* H H*').map((o) => o.latex4!.slice(0, 40))).toEqual(
      Array(2)
        .fill('({\\bar{L}}_{i}\\gamma^{\\mu}{L}^{i})\\,(D_{\\mu}H)')
        .map((s, i) => (i === 0 ? s : '({\\bar{L}}_{i}\\gamma^{\\mu}{L}^{j})\\,(D_{\\mu}H)'))
        .map((s) => s.slice(0, 40)),
    )
    expect(op('B_L L e* H*')[0]!.latex4).toBe('({\\bar{e}}\\sigma^{\\mu\\nu}{L}^{i})\\,{B}_{\\mu\\nu}\\,{H^{\\dagger}}_{i}')
    expect(op('L* e H^2 H*')[0]!.latex4).toBe('({\\bar{L}}_{i}{e})\\,H^{i}\\,H^{j}\\,{H^{\\dagger}}_{j}')
  })
})

describe('Hermiticity and CP (Grzadkowski et al., JHEP 10 (2010) 085, Tables 2–3)', () => {
  const sum = (f: (c: ClassReport) => boolean, k: 'cpEven' | 'cpOdd') => d6.classes.filter(f).reduce((s, c) => s + (c[k] ?? NaN), 0)
  it('bosonic classes: X^3 and X^2H^2 split into CP-even (X, XX) and CP-odd (X̃) operators; H^6, H^4D^2 are CP-even', () => {
    expect(sum((c) => shape(c).X === 3, 'cpEven')).toBe(2) // Q_G, Q_W
    expect(sum((c) => shape(c).X === 3, 'cpOdd')).toBe(2) // Q_G̃, Q_W̃
    expect(sum((c) => shape(c).X === 2, 'cpEven')).toBe(4) // Q_HG, Q_HW, Q_HB, Q_HWB
    expect(sum((c) => shape(c).X === 2, 'cpOdd')).toBe(4) // tilde partners
    expect(sum((c) => shape(c).psi === 0 && shape(c).X === 0, 'cpEven')).toBe(3) // Q_H, Q_H□, Q_HD
    expect(sum((c) => shape(c).psi === 0 && shape(c).X === 0, 'cpOdd')).toBe(0)
  })
  it('fermionic operators carry CP labels too: every Hermitian one of SMEFT is CP-even, every non-Hermitian one gives one CP-even and one CP-odd parameter; 84 = 57 + 27 as the CP-twisted count (Alonso, Jenkins, Manohar, Trott, JHEP 04 (2014) 159: 53 + 23 without the 4 + 4 baryon-number violating)', () => {
    for (const c of d6.classes) {
      expect(c.tallyOk, c.message).toBe(true) // includes the CP tally against the Hilbert series
      for (const o of c.operators) expect(o.cp, `${c.key} ${o.text}`).toBe(!c.selfConjugate ? 'both' : shape(c).psi > 0 ? 'even' : o.cp)
    }
    expect([sum(() => true, 'cpEven'), sum(() => true, 'cpOdd')]).toEqual([57, 27])
    expect([sum((c) => shape(c).baryon === 0, 'cpEven'), sum((c) => shape(c).baryon === 0, 'cpOdd')]).toEqual([53, 23])
  })
  it('self-conjugate classes get Hermitian operators (one real parameter each); others are non-Hermitian', () => {
    for (const c of d6.classes) {
      for (const o of c.operators) {
        expect(o.hermitian).toBe(c.selfConjugate)
        expect(o.realParameters).toBe(c.selfConjugate ? 1 : 2)
      }
    }
  })
})
