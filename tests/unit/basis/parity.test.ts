import { describe, expect, it } from 'vitest'
import { buildBasis, classBasis, basisSpecies, parseClassKey, type ClassReport } from '../../../server/engine/basis/index'
import { describeOperators } from '../../../server/engine/basis/describe'
import { parityLegMap, parityPartners } from '../../../server/engine/basis/parityPartners'
import { parityLorentz } from '../../../server/engine/basis/parity'
import type { Theory } from '../../../shared/schemas/theory'
import photonsJson from '../../../shared/presets/photons.json'
import realScalarJson from '../../../shared/presets/real-scalar.json'
import qedJson from '../../../shared/presets/qed.json'
import qcdJson from '../../../shared/presets/qcd-like.json'
import smeftJson from './fixtures/smeft.json'
import katex from 'katex'

const photons = photonsJson as Theory
const realScalar = realScalarJson as Theory
const qed = qedJson as Theory
const smeft = smeftJson as Theory
const scalars = (names: string[]): Theory => ({ name: 'distinct real scalars', frame: 'relativistic', groups: [], fields: names.map((name) => ({ name, lorentz: 'scalar' as const, real: true })) })
const sum = (cs: ClassReport[], f: (c: ClassReport) => number | null): number => cs.reduce((s, c) => s + f(c)!, 0)

describe('parity partners and the image of a class (conventions: parity.ts, parityPartners.ts)', () => {
  it('QED: eL ↔ eR, eL* ↔ eR*, A_L ↔ A_R (a Dirac fermion = L + R with equal charges; common practice)', () => {
    const m = parityPartners(basisSpecies(qed))
    expect(Object.fromEntries(m)).toEqual({ eL: 'eR', eR: 'eL', 'eL*': 'eR*', 'eR*': 'eL*', A_L: 'A_R', A_R: 'A_L' })
  })
  it('SMEFT: chiral fermions have no partner, H and the field strengths do (common practice)', () => {
    const m = parityPartners(basisSpecies(smeft))
    for (const f of ['Q', 'u', 'd', 'L', 'e', 'Q*', 'e*']) expect(m.has(f)).toBe(false)
    expect(m.get('H')).toBe('H')
    expect(m.get('W_L')).toBe('W_R')
  })
  it('⟨14⟩[23] ↦ [32]⟨41⟩ = ⟨14⟩[23] under legs (13)(24), orientation signs kept (common practice)', () => {
    expect(parityLorentz({ derivs: [0, 0, 0, 0], angle: [[0, 3]], square: [[1, 2]] }, [2, 3, 0, 1])).toEqual({ lorentz: { derivs: [0, 0, 0, 0], angle: [[0, 3]], square: [[1, 2]] }, sign: 1 })
    expect(parityLorentz({ derivs: [0, 0, 0, 0], angle: [[0, 1]], square: [] }, [1, 0, 2, 3]).sign).toBe(-1) // ⟨12⟩ ↦ [21] = −[12]
  })
  it('the leg map refuses a class that P does not map to itself, naming it', () => {
    const ps = basisSpecies(qed)
    expect(() => parityLegMap(ps, parseClassKey(ps, 'eL eR* A_L'))).toThrow('Parity does not map the class eL eR* A_L to itself (eL has no partner)')
  })
})

describe('photons only at dimension 8 (Euler & Heisenberg, Z. Phys. 98 (1936) 714; common practice)', () => {
  const d8 = buildBasis(photons, { minDim: 8, maxDim: 8 }).byDimension[0]!
  const byKey = Object.fromEntries(d8.classes.map((c) => [c.key, c]))
  it('(FF)² and (FF̃)² P-even, (FF)(FF̃) P-odd: 2 even and 1 odd real parameters in total', () => {
    expect(sum(d8.classes, (c) => c.pEven)).toBe(2)
    expect(sum(d8.classes, (c) => c.pOdd)).toBe(1)
    expect(sum(d8.classes, (c) => c.pEven! + c.pOdd!)).toBe(d8.operators) // = Hilbert-series total 3
  })
  it('F_L^2 F_R^2 is mapped to itself and its operator ⟨12⟩²[34]² is P-even; F_L^4 ↔ F_R^4 (its conjugate) gives 1 + 1', () => {
    const mixed = byKey['A_L^2 A_R^2']!
    expect(mixed.parityImageKey).toBe('A_L^2 A_R^2')
    expect(mixed.operators.map((o) => o.parity)).toEqual(['even'])
    const l4 = byKey['A_L^4']!
    expect(l4.parityImageKey).toBe('A_R^4')
    expect([l4.pEven, l4.pOdd]).toEqual([1, 1])
    expect(l4.operators.map((o) => o.parity)).toEqual([null])
  })
  it('for photons alone C is +1 on F^4 (C: F → −F), so P = CP class by class (common practice)', () => {
    for (const c of d8.classes) expect([c.pEven, c.pOdd]).toEqual([c.cpEven, c.cpOdd])
  })
})

describe('scalars (common practice)', () => {
  it('one real scalar: φ^6 is P-even', () => {
    const b = classBasis(realScalar, 'phi^6')
    expect(b.parity.kind).toBe('self')
    expect(describeOperators(b).map((o) => o.parity)).toEqual(['even'])
    const d6 = buildBasis(realScalar, { minDim: 6, maxDim: 6 }).byDimension[0]!
    expect([sum(d6.classes, (c) => c.pEven), sum(d6.classes, (c) => c.pOdd)]).toEqual([1, 0])
  })
  it('five distinct real scalars, D^4: 15 P-even (quadratics in the 5 independent s_ij) and 1 P-odd, ε_{μνρσ}p1^μ p2^ν p3^ρ p4^σ', () => {
    // Five-point massless kinematics: 5 independent Mandelstams, C(6,2) = 15 quadratic
    // monomials; ε(p1,p2,p3,p4) is the only pseudoscalar (momentum conservation). Common practice.
    const b = classBasis(scalars(['a', 'b', 'c', 'd', 'e']), 'D^4 a b c d e')
    expect(b.rank).toBe(16)
    expect([b.parity.pEven, b.parity.pOdd]).toEqual([15, 1])
    const ops = describeOperators(b)
    expect(ops.every((o) => o.parity !== null)).toBe(true)
    // Real scalars: C acts trivially, so P agrees with CP operator by operator.
    expect(ops.map((o) => o.parity)).toEqual(ops.map((o) => o.cp))
  })
})

describe('QED with one Dirac fermion (preset qed; Dirac bilinears under ψ → γ⁰ψ, common practice)', () => {
  const r = buildBasis(qed, { minDim: 5, maxDim: 6 })
  const d5 = r.byDimension.find((d) => d.dimension === 5)!
  const d6 = r.byDimension.find((d) => d.dimension === 6)!
  const byKey = Object.fromEntries(d6.classes.map((c) => [c.key, c]))
  it('dimension 5: the dipole class ψ̄σ^{μν}ψF_{μν} (P-even magnetic) and ψ̄σ^{μν}iγ5ψF_{μν} (P-odd electric): 1 + 1', () => {
    expect(d5.tallyOk).toBe(true)
    expect(d5.classes.map((c) => [c.key, c.parityImageKey, c.realParameters, c.pEven, c.pOdd])).toEqual([['eL eR* A_L', 'eL* eR A_R', 2, 1, 1]])
  })
  it('dimension 6 four-fermion: 3 P-even, 2 P-odd real parameters; the 5 agree with the Hilbert series', () => {
    // One flavor: V_L², V_R², V_L V_R (Hermitian) and S² = (ψ̄_R ψ_L)² (complex): 5 real. P swaps
    // L ↔ R: V_L² ± V_R² (even/odd), V_L V_R even, S² + S†² even and i(S² − S†²) odd. In Dirac
    // form (ψ̄ψ)², (ψ̄γ5ψ)², (ψ̄γψ)², (ψ̄γγ5ψ)² are P-even, (ψ̄ψ)(ψ̄iγ5ψ), (ψ̄γψ)(ψ̄γγ5ψ) P-odd.
    expect(d6.tallyOk).toBe(true)
    expect(d6.operators).toBe(5)
    expect(sum(d6.classes, (c) => c.pEven)).toBe(3)
    expect(sum(d6.classes, (c) => c.pOdd)).toBe(2)
    expect(byKey['eL eL* eR eR*']!.operators.map((o) => o.parity)).toEqual(['even'])
    expect([byKey['eL*^2 eR^2']!.pEven, byKey['eL*^2 eR^2']!.pOdd]).toEqual([1, 1])
    // V_L² ↔ V_R²: the pair carries one even (credited to eL^2 eL*^2) and one odd parameter.
    expect([byKey['eL^2 eL*^2']!.parityImageKey, byKey['eL^2 eL*^2']!.pEven, byKey['eL^2 eL*^2']!.pOdd]).toEqual(['eR^2 eR*^2', 1, 0])
    expect([byKey['eR^2 eR*^2']!.pEven, byKey['eR^2 eR*^2']!.pOdd]).toEqual([0, 1])
  })
  it('a larger self-mapped class gets a P-eigenbasis (every kept operator definite); the counts do not depend on the choice', () => {
    const key = 'D^2 eL eL* eR eR* A_L A_R'
    const b = classBasis(qed, key)
    const ops = describeOperators(b)
    expect(ops.every((o) => o.parity !== null)).toBe(true)
    expect(ops.filter((o) => o.parity === 'even').length).toBe(b.parity.pEven)
    const plain = classBasis(qed, key, { priorities: { preferParity: false } })
    expect(plain.rank).toBe(b.rank)
    expect([plain.parity.pEven, plain.parity.pOdd]).toEqual([b.parity.pEven, b.parity.pOdd])
    expect(b.parity.pEven! + b.parity.pOdd!).toBe(b.rank)
  })
  it('η = 1 convention: ψᵀCγ^μγ5ψ ∂_μa b (neutral Dirac pair, fermion number violated) is P-even — a polar vector (common practice, derived from γ^{μT} = −Cγ^μC⁻¹)', () => {
    const nd: Theory = {
      name: 'neutral Dirac',
      frame: 'relativistic',
      groups: [],
      fields: [
        { name: 'NL', lorentz: 'left-weyl' },
        { name: 'NR', lorentz: 'right-weyl' },
        { name: 'a', lorentz: 'scalar', real: true },
        { name: 'b', lorentz: 'scalar', real: true },
      ],
    }
    const b = classBasis(nd, 'D NL NR a b')
    expect(b.rank).toBe(1)
    expect(describeOperators(b).map((o) => o.parity)).toEqual(['even'])
    expect([b.parity.pEven, b.parity.pOdd]).toEqual([2, 0]) // complex coefficient: 2 real parameters
  })
})

describe('P-eigen columns against the direct computation (common practice: the ±1 eigenspaces of an involution)', () => {
  const nd: Theory = {
    name: 'neutral Dirac',
    frame: 'relativistic',
    groups: [],
    fields: [
      { name: 'NL', lorentz: 'left-weyl' },
      { name: 'NR', lorentz: 'right-weyl' },
      { name: 'a', lorentz: 'scalar', real: true },
      { name: 'b', lorentz: 'scalar', real: true },
    ],
  }
  const cases: [Theory, string][] = [
    [photons, 'A_L^2 A_R^2'],
    [scalars(['a', 'b', 'c', 'd', 'e']), 'D^4 a b c d e'],
    [qed, 'eL eL* eR eR*'],
    [qed, 'D^4 eL eL* eR eR*'],
    [nd, 'D NL NR a b'],
  ]
  it.each(cases)('%s %s: same P-even/P-odd counts with and without the P-eigen choice', (t, key) => {
    const direct = classBasis(t, key, { priorities: { preferParity: false } })
    const eigen = classBasis(t, key)
    expect(direct.kept.some((k) => / P$/.test(k.text))).toBe(false)
    expect([eigen.parity.pEven, eigen.parity.pOdd]).toEqual([direct.parity.pEven, direct.parity.pOdd])
    expect(eigen.kept.every((k) => k.parityEigen !== undefined)).toBe(true)
  })
  it('a user-kept operator is imaged and solved for: ⟨12⟩²[34]² in F_L^2 F_R^2 is P-even', () => {
    const b = classBasis(photons, 'A_L^2 A_R^2', { priorities: { keep: { 'A_L^2 A_R^2': ['<12>^2[34]^2'] } } })
    expect(b.kept.map((k) => [k.source, k.parityEigen])).toEqual([['kept', undefined]])
    expect(describeOperators(b).map((o) => o.parity)).toEqual(['even'])
  })
  it('P-eigen combinations render in LaTeX as (…) ± 𝒫 and KaTeX accepts them', () => {
    const ops = describeOperators(classBasis(qed, 'D^2 eL eL* eR eR* A_L A_R'))
    const withP = ops.filter((o) => o.latex.includes('\\mathcal{P}'))
    expect(withP.length).toBeGreaterThan(0)
    for (const o of withP) expect(() => katex.renderToString(o.latex, { throwOnError: true })).not.toThrow()
  })
})

describe('SMEFT (Grzadkowski, Iskrzyński, Misiak & Rosiek, JHEP 10 (2010) 085)', () => {
  const d6 = buildBasis(smeft, { minDim: 6, maxDim: 6 }).byDimension[0]!
  it('parity is null with a reason for every class with chiral fermions', () => {
    const fermionic = d6.classes.filter((c) => /\b(Q|u|d|L|e)\b/.test(c.key.replace(/\*/g, '')))
    expect(fermionic.length).toBeGreaterThan(0)
    for (const c of fermionic) {
      expect([c.pEven, c.pOdd, c.parityImageKey]).toEqual([null, null, null])
      expect(c.parityReason).toMatch(
        new RegExp(
          `^P is not defined on class ${c.key.replace(/[*^]/g, '\\$&')}: (Q|u|d|L|e)\\*? has no parity partner \\(no field of opposite chirality with identical gauge and discrete charges\\)$`,
        ),
      )
      expect(c.operators.every((o) => o.parity === null)).toBe(true)
    }
  })
  it('bosonic classes: X³, X²H², H⁶, H⁴D² give 9 P-even and 6 P-odd (the X̃ operators), as CP', () => {
    const bosonic = d6.classes.filter((c) => c.pEven !== null)
    expect(sum(bosonic, (c) => c.pEven)).toBe(9)
    expect(sum(bosonic, (c) => c.pOdd)).toBe(6)
    for (const c of bosonic) expect([c.pEven, c.pOdd]).toEqual([c.cpEven, c.cpOdd])
  })
})

describe('several flavors', () => {
  it('a class mapped to itself with flavored fermions is not computed and says so', () => {
    const d6 = buildBasis(qcdJson as Theory, { minDim: 6, maxDim: 6 }).byDimension[0]!
    const c = d6.classes.find((x) => x.key === 'q q* qR qR*')!
    expect([c.pEven, c.pOdd]).toEqual([null, null])
    expect(c.parityReason).toBe('class q q* qR qR*: parity counts with several flavors are not computed for a class mapped to itself')
    const pair = d6.classes.filter((x) => x.key === 'q^2 q*^2' || x.key === 'qR^2 qR*^2')
    expect(sum(pair, (x) => x.pEven)).toBe(sum(pair, (x) => x.pOdd)) // L⁴ ↔ R⁴: as many even as odd
  })
})
