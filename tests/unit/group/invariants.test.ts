import { describe, expect, it } from 'vitest'
import { alternatingPower, symmetricPower, suCasimir, suConjugate, suCubicAnomaly, suDimension, suIndex, suReality, tensorProduct } from '../../../server/engine/group/index'
import { type Rational, add, equals, mul, parseRational, rat, toString } from '../../../server/engine/exact/rational'

const q = (s: string): string => toString(parseRational(s))

describe('conjugate and reality', () => {
  it('conjugation reverses the Dynkin labels (Slansky, Phys. Rep. 79 (1981) 1, §4)', () => {
    expect(suConjugate(5, [0, 1, 0, 0])).toEqual([0, 0, 1, 0])
    expect(suConjugate(3, [2, 1])).toEqual([1, 2])
  })

  it('reality (Slansky, Phys. Rep. 79 (1981) 1, Table 11 / §4)', () => {
    expect(suReality(2, [1])).toBe('pseudoreal')
    expect(suReality(2, [2])).toBe('real')
    expect(suReality(2, [3])).toBe('pseudoreal')
    expect(suReality(3, [1, 1])).toBe('real')
    expect(suReality(3, [1, 0])).toBe('complex')
    expect(suReality(4, [0, 1, 0])).toBe('real')
    expect(suReality(6, [0, 0, 1, 0, 0])).toBe('pseudoreal')
    expect(suReality(6, [0, 0, 2, 0, 0])).toBe('real')
    expect(suReality(8, [0, 0, 0, 1, 0, 0, 0])).toBe('real') // Λ^4 of SU(8): n ≡ 0 mod 4 (Slansky §4)
    expect(suReality(6, [1, 0, 1, 0, 1])).toBe('pseudoreal') // exponent Σ i(n-i) a_i = 5+9+5 odd (Bourbaki, Lie VIII §7)
  })

  it('self-conjugate irreps are exactly those with a singlet in R ⊗ R; real iff in Sym^2 (common practice)', () => {
    for (const [n, a] of [
      [2, [1]],
      [2, [2]],
      [4, [0, 1, 0]],
      [3, [1, 1]],
      [6, [0, 0, 1, 0, 0]],
      [3, [1, 0]],
    ] as const) {
      const r = suReality(n, a)
      const inProduct = tensorProduct(n, a, a).get(new Array(n - 1).fill(0).join(',')) ?? 0
      expect(inProduct, `${n}:${a}`).toBe(r === 'complex' ? 0 : 1)
    }
  })
})

/** (λ, λ + 2ρ)/2 via the inverse Cartan matrix G_ij = min(i,j)(n - max(i,j))/n (Slansky, Table 7). */
function casimirFromCartan(n: number, a: number[]): Rational {
  let s = rat(0)
  for (let i = 1; i < n; i++) {
    for (let j = 1; j < n; j++) {
      const g = rat(Math.min(i, j) * (n - Math.max(i, j)), n)
      s = add(s, mul(g, rat(a[i - 1]! * (a[j - 1]! + 2))))
    }
  }
  return mul(s, rat(1, 2))
}

describe('reality against the symmetric square', () => {
  it('self-conjugate R is real iff Sym^2 R holds the singlet, pseudoreal iff Λ^2 R does (Fulton & Harris, §3.5)', () => {
    const cases: Array<[number, number[]]> = [
      [2, [3]],
      [2, [4]],
      [4, [0, 1, 0]],
      [4, [1, 0, 1]],
      [6, [0, 0, 1, 0, 0]],
      [6, [1, 0, 0, 0, 1]],
      [3, [2, 2]],
    ]
    for (const [n, a] of cases) {
      const zero = new Array(n - 1).fill(0).join(',')
      const sym = symmetricPower(n, a, 2).get(zero) ?? 0
      const alt = alternatingPower(n, a, 2).get(zero) ?? 0
      expect([sym, alt], `${n}:${a}`).toEqual(suReality(n, a) === 'real' ? [1, 0] : [0, 1])
    }
  })
})

describe('Casimir, index, cubic anomaly', () => {
  it('C2 equals (λ, λ+2ρ)/2 from the inverse Cartan matrix (Slansky, Phys. Rep. 79 (1981) 1, eq. (4.14))', () => {
    for (const [n, a] of [
      [2, [3]],
      [3, [2, 1]],
      [4, [1, 2, 0]],
      [5, [0, 1, 1, 0]],
      [8, [1, 0, 0, 2, 0, 0, 1]],
    ] as const) {
      expect(equals(suCasimir(n, [...a]), casimirFromCartan(n, [...a])), `${n}:${a}`).toBe(true)
    }
    expect(toString(suCasimir(3, [1, 0]))).toBe('4/3') // C_F = 4/3 (common practice)
    expect(toString(suCasimir(3, [1, 1]))).toBe('3') // C_A = N (common practice)
  })

  it('Dynkin index, T(fund) = 1/2 (Slansky, Phys. Rep. 79 (1981) 1, Table 30, l = 2T; values from memory)', () => {
    expect(toString(suIndex(5, [1, 0, 0, 0]))).toBe(q('1/2'))
    expect(toString(suIndex(5, [0, 1, 0, 0]))).toBe(q('3/2'))
    expect(toString(suIndex(5, [2, 0, 0, 0]))).toBe(q('7/2'))
    expect(toString(suIndex(5, [1, 0, 0, 1]))).toBe('5')
    expect(toString(suIndex(3, [2, 0]))).toBe(q('5/2'))
    expect(toString(suIndex(3, [3, 0]))).toBe(q('15/2'))
    expect(toString(suIndex(3, [2, 2]))).toBe('27')
    expect(toString(suIndex(2, [2]))).toBe('2') // T(j) = j(j+1)(2j+1)/3 (common practice)
    expect(toString(suIndex(6, [0, 0, 1, 0, 0]))).toBe('3')
  })

  it('cubic anomaly, A(fund) = 1 (Banks & Georgi, Phys. Rev. D 14 (1976) 1159; Slansky Table 30; from memory)', () => {
    for (let n = 3; n <= 8; n++) {
      const fund = [1, ...new Array(n - 2).fill(0)]
      const anti2 = [0, 1, ...new Array(n - 3).fill(0)]
      const sym2 = [2, ...new Array(n - 2).fill(0)]
      const adj = [1, ...new Array(n - 3).fill(0), 1]
      expect(toString(suCubicAnomaly(n, fund))).toBe('1')
      expect(toString(suCubicAnomaly(n, anti2)), `antisym SU(${n})`).toBe(`${n - 4}`)
      expect(toString(suCubicAnomaly(n, sym2)), `sym SU(${n})`).toBe(`${n + 4}`)
      expect(toString(suCubicAnomaly(n, adj))).toBe('0')
      expect(toString(suCubicAnomaly(n, suConjugate(n, anti2)))).toBe(`${4 - n}`)
    }
    expect(toString(suCubicAnomaly(5, [0, 1, 0, 0]))).toBe('1') // the 10 of SU(5)
    expect(toString(suCubicAnomaly(3, [3, 0]))).toBe('27') // (n+3)(n+6)/2 for Sym^3 (Banks & Georgi)
    expect(toString(suCubicAnomaly(2, [3]))).toBe('0') // SU(2) has no cubic invariant (common practice)
  })

  it('index and anomaly are additive-multiplicative on products: X(R⊗S) = dim R X(S) + dim S X(R) (Banks & Georgi 1976)', () => {
    const pairs: Array<[number, number[], number[]]> = [
      [3, [1, 0], [2, 1]],
      [4, [0, 1, 0], [1, 0, 1]],
      [5, [1, 0, 0, 0], [0, 0, 1, 1]],
    ]
    for (const [n, a, b] of pairs) {
      for (const f of [suIndex, suCubicAnomaly]) {
        let lhs = rat(0)
        for (const [k, m] of tensorProduct(n, a, b)) lhs = add(lhs, mul(rat(m), f(n, k.split(',').map(Number))))
        const rhs = add(mul(rat(suDimension(n, a)), f(n, b)), mul(rat(suDimension(n, b)), f(n, a)))
        expect(toString(lhs), `${f.name} ${n}:${a}x${b}`).toBe(toString(rhs))
      }
    }
  })
})
