/**
 * Benchmark of the heavy-particle frame at 1/m⁴ (server/engine/heavy). Each figure is the
 * median wall time (ms) of cold computations (memoised spaces cleared between repeats) with
 * the count as a correctness stamp: QED 12 (Hill, Lee, Paz, Solon, Phys. Rev. D 87 (2013)
 * 053017, from memory); SU(3) 25 with P and T, confirmed by a second generating set (D and
 * D_t words only) timed here as well; without P and T 88; heavy–light operators of a heavy
 * lepton with a light Dirac electron to 1/m⁴; two-particle contact operators; the
 * four-fermion operators with a field strength.
 */
import { clearOrderSpaces, defaultConfig, orderSpaceFor } from '../server/engine/heavy/orderSpace'
import { letterSequences, relationStructures, structuresOn, tracedCombos } from '../server/engine/heavy/candidates'
import { daggerCombo, expandCombo, expandStructure, simplifyCombo, thetaCombo, type Combo } from '../server/engine/heavy/structure'
import { QuotientSpace } from '../server/engine/heavy/quotient'
import { enumerateHeavyLight } from '../server/engine/heavy/heavyLight'
import type { TheoryFieldLike } from '../server/engine/heavy/lightFields'
import { enumerateHeavyHeavy } from '../server/engine/heavy/heavyHeavy'
import { enumerateFourField } from '../server/engine/heavy/fourField'
import { median } from './support/timing'

interface Figure {
  median_ms: number
  repeats: number
  count: number
  expected: number | null
}

function time(repeats: number, expected: number | null, f: () => number): Figure {
  const times: number[] = []
  let count = 0
  for (let i = 0; i < repeats; i++) {
    clearOrderSpaces()
    const t0 = performance.now()
    count = f()
    times.push(performance.now() - t0)
  }
  return { median_ms: Math.round(median(times)), repeats, count, expected }
}

/** SU(N) at 1/m⁴ from D/T words and traces only (E, B are commutators): an independent generating set. */
function fromWords(N: number): number {
  const seeds: Combo[] = [...tracedCombos(5, ['E', 'B']), ...structuresOn(letterSequences(5, ['D', 'T'])).map((s): Combo => [{ coef: 1, s }])]
  const els = seeds.flatMap((b) => {
    const sym = simplifyCombo([...b, ...thetaCombo(b)])
    if (!sym.length) return []
    return [false, true]
      .map((anti) => simplifyCombo([...sym, ...daggerCombo(sym).map((t) => ({ coef: anti ? -t.coef : t.coef, s: t.s }))]))
      .filter((c) => c.length)
      .map((c) => expandCombo(c))
  })
  return new QuotientSpace(
    els,
    relationStructures(5)
      .map((s) => expandStructure(s))
      .filter((e) => e.size > 0),
    { colorN: N },
  ).dimension
}

const electron: TheoryFieldLike[] = [
  { name: 'eL', lorentz: 'left-weyl', charges: { QED: '-1' } },
  { name: 'eR', lorentz: 'right-weyl', charges: { QED: '-1' } },
]

export default async function heavyBench(): Promise<Record<string, Figure>> {
  return {
    'QED bilinears 1/m^4': time(3, 12, () => orderSpaceFor(4, defaultConfig(1)).space.dimension),
    'SU(3) bilinears 1/m^4': time(3, 25, () => orderSpaceFor(4, defaultConfig(3)).space.dimension),
    'SU(3) 1/m^4 from D/T words (check)': time(1, 25, () => fromWords(3)),
    'SU(3) bilinears 1/m^4 without P and T': time(1, 88, () => orderSpaceFor(4, { ...defaultConfig(3), parity: false, timeReversal: false }).space.dimension),
    'SU(3)xU(1) bilinears 1/m^3': time(
      3,
      19,
      () =>
        orderSpaceFor(3, {
          setup: {
            colorN: 3,
            factors: [
              { kind: 'su', coupled: true },
              { kind: 'u1', coupled: true },
            ],
          },
          parity: true,
          timeReversal: true,
        }).space.dimension,
    ),
    'heavy-light lepton + electron to 1/m^4': time(3, null, () =>
      enumerateHeavyLight({
        particle: 'mu',
        heavy: { reps: {}, charges: { QED: '-1' } },
        fields: electron,
        groups: [{ name: 'QED', type: 'U1', gauge: true }],
        maxOrder: 4,
        parity: true,
        timeReversal: true,
      }).classes.reduce((s, c) => s + c.count, 0),
    ),
    'heavy-heavy SU(2) 1/m^4': time(3, 12, () => enumerateHeavyHeavy(4, 2, 'N', true).count),
    'four-fermion with B, SU(3)': time(3, 4, () => enumerateFourField(3, 'psi', 'chi').basis.length),
  }
}
