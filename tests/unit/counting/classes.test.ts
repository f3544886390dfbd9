import { describe, expect, it } from 'vitest'
import { findPreset } from '../../../shared/presets/index'
import { parseTheory } from '../../../server/engine/theory/parseTheory'
import { enumerateClasses, enumerateFieldContents } from '../../../server/engine/counting/classes'
import { classKeyOfCounts as classKey, countsOfClassKey as parseClassKey, readClassKey } from '../../../server/engine/theory/classKey'
import { lorentzSingletSeries } from '../../../server/engine/counting/lorentz'
import { cycleTypes } from '../../../server/engine/counting/cycleTypes'
import { GroupIntegrator, suScheme } from '../../../server/engine/counting/groupFactor'
import { EngineConsistencyError, EngineInputError } from '../../../server/engine/errors'
import { buildTheoryModel } from '../../../server/engine/theory/model'
import { characterProduct } from '../../../server/engine/group/character'
import { lorentzSingletCount, lorentzWeights } from '../../../server/engine/group/lorentz'

const smeft = buildTheoryModel(parseTheory(findPreset('smeft')!.theory))
const scalar = buildTheoryModel(parseTheory(findPreset('real-scalar')!.theory))

describe('class keys', () => {
  it('species order: fields in file order, each followed by its conjugate, field strengths as chiral halves', () => {
    expect(smeft.species.map((s) => s.label)).toEqual(['Q', 'Q*', 'u', 'u*', 'd', 'd*', 'L', 'L*', 'e', 'e*', 'H', 'H*', 'G_L', 'G_R', 'W_L', 'W_R', 'B_L', 'B_R'])
  })

  it('D^k first, powers as ^n, single spaces; countsOfClassKey inverts classKeyOfCounts', () => {
    const { counts, derivatives } = parseClassKey(smeft, 'D^2 H^2 H*^2')
    expect(derivatives).toBe(2)
    expect(classKey(smeft, counts, 2)).toBe('D^2 H^2 H*^2')
    expect(classKey(smeft, parseClassKey(smeft, 'G_L^3').counts, 0)).toBe('G_L^3')
    expect(classKey(smeft, parseClassKey(smeft, 'H* D L* L H').counts, 1)).toBe('D L L* H H*')
    expect(() => parseClassKey(smeft, 'D^2 X^2')).toThrow(
      'The class "D^2 X^2" names "X", which is not a field of this theory (its fields are Q, Q*, u, u*, d, d*, L, L*, e, e*, H, H*, G_L, G_R, W_L, W_R, B_L, B_R)',
    )
    expect(() => parseClassKey(smeft, 'D^0 H')).toThrow('Cannot read "D^0" in the class "D^0 H"')
    expect(readClassKey('H D H* D^2')).toEqual({
      derivatives: 3,
      blocks: [
        { label: 'H', power: 1 },
        { label: 'H*', power: 1 },
      ],
    })
  })

  it('enumerates dimension-6 SMEFT classes passing the selection rules (hypercharge, triality, Lorentz parity; common practice)', () => {
    const keys = enumerateClasses(smeft, 6).map((c) => c.key)
    expect(keys).toContain('H^3 H*^3')
    expect(keys).toContain('D^2 H^2 H*^2')
    expect(keys).toContain('Q^3 L')
    expect(keys).not.toContain('H^3 H*^2') // hypercharge 1/2
    expect(keys).not.toContain('D H^2 H*^2') // odd derivative number with no fermions
    expect(keys).not.toContain('Q^2 L^2') // SU(3) triality
    for (const c of enumerateClasses(smeft, 6)) expect(c.dimension).toBe(6)
    expect(() => enumerateClasses(smeft, 0)).toThrow(EngineInputError)
  })

  it('real scalar, dimensions 5..6: the field contents and their allowed derivative numbers (Lorentz parity: k even)', () => {
    const contents = enumerateFieldContents(scalar, 5, 6).map((c) => [c.counts[0], c.derivatives])
    expect(contents).toEqual([
      [1, [4]],
      [2, [4]],
      [3, [2]],
      [4, [2]],
      [5, [0]],
      [6, [0]],
    ])
    expect(() => enumerateFieldContents(scalar, 7, 6)).toThrow('The dimensions must be whole numbers with 1 ≤ lowest ≤ highest ≤ 30, not 7 to 6')
  })
})

describe('Lorentz factor and cycle types', () => {
  it('cycle types of S_3 with class sizes 2, 3, 1 (Sagan, The Symmetric Group, Prop. 1.1.1)', () => {
    expect(cycleTypes(3).map((t) => [t.parts, t.size, t.sign])).toEqual([
      [[3], 2, 1],
      [[2, 1], 3, -1],
      [[1, 1, 1], 1, 1],
    ])
    expect(() => cycleTypes(19)).toThrow('Operators with more than 18 copies of one field are beyond the counting engine (here 19)')
  })

  it('φ^2 keeps only the mass term: Sym^2 of the scalar module times 1/P gives 1 at D^0 and nothing at D^2, D^4 (common practice: ∂φ∂φ ~ φ□φ = 0)', () => {
    const a = lorentzSingletSeries(
      [
        { type: 'S', cycle: 1 },
        { type: 'S', cycle: 1 },
      ],
      4,
    )
    const b = lorentzSingletSeries([{ type: 'S', cycle: 2 }], 4)
    expect(a.map((x, i) => (x + b[i]!) / 2)).toEqual([1, 0, 0, 0, 0])
  })

  it('F_L^3: the Lorentz-symmetric cube has no singlet, the antisymmetric one has one (used with f^abc; common practice)', () => {
    const one = lorentzSingletSeries(
      [
        { type: 'FL', cycle: 1 },
        { type: 'FL', cycle: 1 },
        { type: 'FL', cycle: 1 },
      ],
      0,
    )[0]!
    const two = lorentzSingletSeries(
      [
        { type: 'FL', cycle: 2 },
        { type: 'FL', cycle: 1 },
      ],
      0,
    )[0]!
    const three = lorentzSingletSeries([{ type: 'FL', cycle: 3 }], 0)[0]!
    expect((one + 3 * two + 2 * three) / 6).toBe(0)
    expect((one - 3 * two + 2 * three) / 6).toBe(1)
    expect(() => lorentzSingletSeries([{ type: 'S', cycle: 0 }], 2)).toThrow(EngineConsistencyError) // built by the engine, never by a user
  })
})

describe('field-content enumeration against a brute-force oracle', () => {
  it('charge pruning keeps exactly the contents with vanishing U(1), Z_n and n-ality totals (oracle: plain enumeration with exact rational sums)', () => {
    const theory = parseTheory({
      name: 'odd charges',
      frame: 'relativistic',
      groups: [
        { name: 'SU3', type: 'SU', n: 3, gauge: true },
        { name: 'X', type: 'U1', gauge: true },
        { name: 'Yp', type: 'U1', gauge: false },
        { name: 'Z3', type: 'Z', n: 3, gauge: false },
      ],
      fields: [
        { name: 'a', lorentz: 'scalar', charges: { X: '1/3', Yp: '-2/7' } },
        { name: 'b', lorentz: 'left-weyl', reps: { SU3: [1, 0] }, charges: { X: '-1/2', Z3: 1 } },
        { name: 'c', lorentz: 'right-weyl', reps: { SU3: [0, 1] }, charges: { X: '1/6', Yp: '2/7' } },
        { name: 'S', lorentz: 'scalar', charges: { X: '1', Z3: 2 } },
        { name: 'F', lorentz: 'field-strength', gaugeOf: 'X' },
      ],
    })
    const model = buildTheoryModel(theory)
    const got = enumerateFieldContents(model, 5, 9).map((c) => `${c.counts.join('')}:${c.derivatives.join(',')}`)
    const want: string[] = []
    const S = model.species.length
    const counts = new Array<number>(S).fill(0)
    const rec = (s: number, used: number): void => {
      if (s === S) {
        if (used === 0) return
        const frac = (g: number) => counts.reduce((t, n, i) => t + n * Number(model.species[i]!.u1[model.u1[g]!.name]!.num) * (42 / Number(model.species[i]!.u1[model.u1[g]!.name]!.den)), 0)
        const zn = counts.reduce((t, n, i) => t + n * model.species[i]!.zn[model.zn[0]!.name]!, 0) % 3
        const tri = counts.reduce((t, n, i) => t + n * (model.species[i]!.reps[model.su[0]!.name]![0]! + 2 * model.species[i]!.reps[model.su[0]!.name]![1]!), 0) % 3
        const left = counts.reduce((t, n, i) => t + (model.species[i]!.lorentz === 'L' ? n : 0), 0)
        const right = counts.reduce((t, n, i) => t + (model.species[i]!.lorentz === 'R' ? n : 0), 0)
        if (frac(0) !== 0 || frac(1) !== 0 || zn !== 0 || tri !== 0 || (left - right) % 2 !== 0) return
        const ks: number[] = []
        for (let k = left % 2; used + 2 * k <= 18; k += 2) if (used + 2 * k >= 10) ks.push(k)
        if (ks.length) want.push(`${counts.join('')}:${ks.join(',')}`)
        return
      }
      for (let n = 0; used + n * model.species[s]!.dim2 <= 18; n++) {
        counts[s] = n
        rec(s + 1, used + n * model.species[s]!.dim2)
      }
      counts[s] = 0
    }
    rec(0, 0)
    expect(want.length).toBeGreaterThan(20)
    expect(got.sort()).toEqual(want.sort())
  })
})

describe('Lorentz integral against the group engine (independent oracle: full characters, Weyl-group singlet count)', () => {
  type T = 'S' | 'L' | 'R' | 'FL' | 'FR'
  const base: Record<T, [number, number]> = { S: [0, 0], L: [1, 0], R: [0, 1], FL: [2, 0], FR: [0, 2] }
  const scale = (ch: Map<string, number>, c: number) =>
    new Map(
      [...ch].map(
        ([k, m]) =>
          [
            k
              .split(';')
              .map((x) => `${Number(x) * c}`)
              .join(';'),
            m,
          ] as const,
      ),
    )
  /** Series (per D-degree) of Π χ_type(D^c; x^c, y^c) × 1/P built from full characters. */
  function oracle(factors: { type: T; cycle: number }[], K: number): number[] {
    let acc: Map<string, number>[] = [new Map([['0;0', 1]])]
    for (let d = 1; d <= K; d++) acc.push(new Map())
    const mulSeries = (terms: [number, Map<string, number>][]) => {
      const out: Map<string, number>[] = acc.map(() => new Map())
      acc.forEach((ch, d) => {
        for (const [deg, t] of terms) {
          if (d + deg > K || ch.size === 0) continue
          for (const [k, m] of characterProduct(ch, t)) out[d + deg]!.set(k, (out[d + deg]!.get(k) ?? 0) + m)
        }
      })
      acc = out
    }
    for (const f of factors) {
      const [a, b] = base[f.type]
      const terms: [number, Map<string, number>][] = []
      for (let k = 0; f.cycle * k <= K; k++) terms.push([f.cycle * k, scale(lorentzWeights([a + k, b + k]), f.cycle)])
      mulSeries(terms)
    }
    const momentum: [number, Map<string, number>][] = [[0, new Map([['0;0', 1]])]]
    const vec = ['1;1', '1;-1', '-1;1', '-1;-1']
    for (let mask = 1; mask < 16; mask++) {
      const picked = vec.filter((_, i) => mask & (1 << i))
      const w = picked.reduce((s, v) => s.map((x, i) => x + Number(v.split(';')[i])), [0, 0]).join(';')
      momentum.push([picked.length, new Map([[w, picked.length % 2 ? -1 : 1]])])
    }
    mulSeries(momentum)
    return acc.map((ch) => lorentzSingletCount(new Map([...ch].filter(([, m]) => m !== 0))))
  }

  it.each([
    [
      [
        { type: 'S', cycle: 1 },
        { type: 'S', cycle: 1 },
        { type: 'S', cycle: 2 },
      ],
      4,
    ],
    [
      [
        { type: 'L', cycle: 1 },
        { type: 'R', cycle: 1 },
        { type: 'S', cycle: 1 },
      ],
      4,
    ],
    [
      [
        { type: 'L', cycle: 2 },
        { type: 'L', cycle: 1 },
        { type: 'FR', cycle: 1 },
      ],
      3,
    ],
    [
      [
        { type: 'FL', cycle: 2 },
        { type: 'FR', cycle: 2 },
      ],
      4,
    ],
    [
      [
        { type: 'S', cycle: 3 },
        { type: 'L', cycle: 1 },
        { type: 'L', cycle: 1 },
        { type: 'FL', cycle: 1 },
      ],
      3,
    ],
  ] as [{ type: T; cycle: number }[], number][])('factors %j up to D^%i', (factors, K) => {
    expect(lorentzSingletSeries(factors, K)).toEqual(oracle(factors, K))
  })
})

describe('SU(n) factor of one cycle type', () => {
  it('∫ χ(g^2) is the Frobenius–Schur indicator: +1 real (SU(3) adjoint), −1 pseudoreal (SU(2) doublet), 0 complex (SU(3) triplet) (Fulton & Harris, Representation Theory, Ex. 3.38)', () => {
    expect(new GroupIntegrator(suScheme(3)).integrate([{ rep: '1,1', cycle: 2 }])).toBe(1)
    expect(new GroupIntegrator(suScheme(2)).integrate([{ rep: '1', cycle: 2 }])).toBe(-1)
    expect(new GroupIntegrator(suScheme(3)).integrate([{ rep: '1,0', cycle: 2 }])).toBe(0)
  })

  it('3 × 3 × 3 ∋ one singlet, 8 × 8 ∋ one singlet, and entry order does not matter (common practice)', () => {
    const g = new GroupIntegrator(suScheme(3))
    expect(
      g.integrate([
        { rep: '1,0', cycle: 1 },
        { rep: '1,0', cycle: 1 },
        { rep: '1,0', cycle: 1 },
      ]),
    ).toBe(1)
    expect(
      g.integrate([
        { rep: '1,1', cycle: 1 },
        { rep: '1,1', cycle: 1 },
      ]),
    ).toBe(1)
    expect(
      g.integrate([
        { rep: '0,1', cycle: 1 },
        { rep: '1,0', cycle: 2 },
      ]),
    ).toBe(
      g.integrate([
        { rep: '1,0', cycle: 2 },
        { rep: '0,1', cycle: 1 },
      ]),
    )
  })
})
