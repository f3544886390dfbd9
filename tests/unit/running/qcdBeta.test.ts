import { describe, expect, it } from 'vitest'
import { qcdBeta, qcdBetaExact } from '../../../server/engine/running/qcdBeta'
import { zrToString } from '../../../server/engine/running/zetaRational'
import { add, mul, parseRational, sub, toString as ratText } from '../../../server/engine/exact/rational'
import { expectClose } from '../scales/expectClose'

const q = parseRational

describe('QCD β coefficients, normalisation da/d ln μ² = −β0 a² − β1 a³ − …, a = α_s/(4π)', () => {
  it('n_f = 5: β0 = 23/3, β1 = 116/3, β2 = 9769/54 exactly (van Ritbergen, Vermaseren, Larin, Phys. Lett. B 400 (1997) 379, eq. (8))', () => {
    const b = qcdBetaExact(5).map(zrToString)
    expect(b.slice(0, 3)).toEqual(['23/3', '116/3', '9769/54'])
  })

  it('n_f = 0: β3 = 149753/6 + 3564 ζ3 (van Ritbergen, Vermaseren, Larin 1997, eq. (8))', () => {
    expect(zrToString(qcdBetaExact(0)[3]!)).toBe('149753/6 + 3564*zeta3')
  })

  it('matches the numerical form of the paper for n_f = 0..6 (van Ritbergen, Vermaseren, Larin 1997, eq. (9))', () => {
    for (let nf = 0; nf <= 6; nf++) {
      const b = qcdBeta(nf)
      expectClose('β0', nf, b[0]!, 11 - 0.6666667 * nf, 1e-6)
      expectClose('β1', nf, b[1]!, 102 - 12.66667 * nf, 1e-4)
      expectClose('β2', nf, b[2]!, 1428.5 - 279.611 * nf + 6.01852 * nf * nf, 2e-3)
      expectClose('β3', nf, b[3]!, 29242.964 - 6946.2896 * nf + 405.08904 * nf * nf + 1.499314 * nf ** 3, 2e-3)
    }
  })

  it('β0, β1 agree with the general-group formulas at C_A = 3, C_F = 4/3, T_F = 1/2 (Gross & Wilczek, PRL 30 (1973) 1343; Politzer, PRL 30 (1973) 1346; Caswell, PRL 33 (1974) 244; Jones, Nucl. Phys. B 75 (1974) 531)', () => {
    const CA = q('3')
    const CF = q('4/3')
    const TF = q('1/2')
    for (let nf = 0; nf <= 6; nf++) {
      const n = q(String(nf))
      const b0 = sub(mul(q('11/3'), CA), mul(mul(q('4/3'), TF), n))
      const b1 = sub(mul(q('34/3'), mul(CA, CA)), add(mul(mul(q('4'), CF), mul(TF, n)), mul(mul(q('20/3'), CA), mul(TF, n))))
      const exact = qcdBetaExact(nf)
      expect(ratText(exact[0]!.rational)).toBe(ratText(b0))
      expect(ratText(exact[1]!.rational)).toBe(ratText(b1))
    }
  })

  it('rejects flavour numbers outside 0..6', () => {
    expect(() => qcdBeta(7)).toThrow('The number of active quark flavours must be a whole number from 0 to 6, not 7')
    expect(() => qcdBetaExact(2.5)).toThrow('The number of active quark flavours must be a whole number from 0 to 6, not 2.5')
  })
})
