import { describe, expect, it } from 'vitest'
import nerdamer from 'nerdamer'
import { TheorySchema } from '../../../shared/schemas/theory'
import { matchHeavyScalar } from '../../../server/engine/matching/treeScalarExchange'
import { EngineInputError } from '../../../server/engine/errors'

// Hand-derived toys (worked in full below; the heavy-field equation of motion at tree level is
// common practice): L ⊃ −½M²S² + c·S·(light pair) gives S = c·(pair)/M² at leading order, and
// substituting back, L_eff ⊃ +c²(pair)²/(2M²).
const theory = (couplings: unknown[], extra: unknown[] = []) =>
  TheorySchema.parse({
    name: 'toy',
    frame: 'relativistic',
    groups: [{ name: 'X', type: 'U1', gauge: false }],
    fields: [{ name: 'phi', lorentz: 'scalar', real: true }, { name: 'H', lorentz: 'scalar', charges: { X: '1' } }, { name: 'S', lorentz: 'scalar', real: true, mass: { symbol: 'M' } }, ...extra],
    couplings,
  })
const shiftOf = (r: ReturnType<typeof matchHeavyScalar>, key: string) => r.shifts.find((s) => s.classKey === key)?.coefficient
const same = (a: string | undefined, b: string) => expect(nerdamer(`(${a}) - (${b})`).expand().toString()).toBe('0')

describe('tree-level matching of a heavy real scalar, order 0', () => {
  // L ⊃ a·S·φ²: S = aφ²/M², L_eff = −½M²(aφ²/M²)² + a²φ⁴/M² = +a²φ⁴/(2M²). Check on amplitudes:
  // vertex 2a, three channels, M = 3(2a)²/M² = 12a²/M² = c·4! → c = a²/(2M²).
  it('S φ² gives the φ⁴ coupling a²/(2M²)', () => {
    const r = matchHeavyScalar(theory([{ class: 'S phi^2', symbol: 'a' }]), 'S')
    same(shiftOf(r, 'phi^4'), 'a^2/(2*M^2)')
    expect(r.shifts.map((s) => s.classKey)).toEqual(['phi^4'])
  })

  // L ⊃ k·S·H†H: S = k|H|²/M², L_eff = +k²|H|⁴/(2M²). Amplitude: vertex k, two channels pair
  // H with H*, M = 2k²/M² = c·(2!·2!) → c = k²/(2M²). Mixed with the first: L ⊃ (aφ² + k|H|²)S gives
  // (aφ² + k|H|²)²/(2M²), so the φ²|H|² coefficient is a·k/M² (same hand derivation).
  it('S H H* gives |H|⁴ with k²/(2M²), and together with S φ² the cross term a·k/M²', () => {
    const r = matchHeavyScalar(
      theory([
        { class: 'S phi^2', symbol: 'a' },
        { class: 'S H H*', symbol: 'k' },
      ]),
      'S',
    )
    same(shiftOf(r, 'H^2 H*^2'), 'k^2/(2*M^2)')
    same(shiftOf(r, 'phi^2 H H*'), 'a*k/M^2')
    same(shiftOf(r, 'phi^4'), 'a^2/(2*M^2)')
    expect(r.assumptions).toMatch(/Tree level only. L contains \+c·O with O exactly as printed/)
    expect(r.notComputed).toHaveLength(2)
  })

  // A Yukawa coupling of S is not matched by this version: it must be listed, never dropped.
  it('a coupling this version does not match (a Yukawa of S) is listed as not computed', () => {
    const psi = [{ name: 'psi', lorentz: 'left-weyl' }]
    const r = matchHeavyScalar(
      theory(
        [
          { class: 'S phi^2', symbol: 'a' },
          { class: 'S psi^2', symbol: 'y' },
        ],
        psi,
      ),
      'S',
    )
    same(shiftOf(r, 'phi^4'), 'a^2/(2*M^2)')
    expect(r.notComputed).toContain('the operators generated through coupling "y" (S psi^2): not computed at tree level by this version')
  })

  it('refuses a field that is not a heavy real singlet scalar with a mass symbol, and mass mixing', () => {
    expect(() => matchHeavyScalar(theory([]), 'H')).toThrow(EngineInputError)
    expect(() => matchHeavyScalar(theory([]), 'H')).toThrow('"H" is not a real scalar singlet; this version matches a heavy real singlet scalar only')
    const noMass = TheorySchema.parse({
      name: 't',
      frame: 'relativistic',
      groups: [],
      fields: [
        { name: 'phi', lorentz: 'scalar', real: true },
        { name: 'S', lorentz: 'scalar', real: true },
      ],
    })
    expect(() => matchHeavyScalar(noMass, 'S')).toThrow(/"S" has no mass symbol/)
    expect(() => matchHeavyScalar(theory([{ class: 'phi S', symbol: 'm' }]), 'S')).toThrow(/Coupling "m" mixes S with a light field/)
  })

  // The gauge contraction of an SU(2) doublet pair at the vertex is not written out by this
  // version: the coupling is listed, and no shift is given for it (never a silent guess).
  it('a coupling to an SU(2) doublet is listed as not computed', () => {
    const t = TheorySchema.parse({
      name: 'doublet',
      frame: 'relativistic',
      groups: [{ name: 'weak', type: 'SU', n: 2, gauge: true }],
      fields: [
        { name: 'H', lorentz: 'scalar', reps: { weak: [1] } },
        { name: 'S', lorentz: 'scalar', real: true, mass: { symbol: 'M' } },
      ],
      couplings: [{ class: 'S H H*', symbol: 'k' }],
    })
    const r = matchHeavyScalar(t, 'S')
    expect(r.shifts).toEqual([])
    expect(r.notComputed.filter((n) => /^the operators generated through coupling "k" \(.+\): not computed at tree level by this version$/.test(n))).toHaveLength(1)
  })
})
