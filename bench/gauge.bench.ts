/**
 * Benchmarks of the running of a theory's own gauge couplings: median wall times (ms).
 * Figures: exact coefficients of the Standard Model; the page's full report (both ways from
 * M_Z over 1 GeV – 10¹⁹ GeV plus a chosen scale) at one and two loops; QCD through a tower of
 * three thresholds; three U(1)s that mix beside SU(3) × SU(2), two loops over 22 decades.
 */
import smeft from '../shared/presets/smeft.json'
import { parseTheory } from '../server/engine/theory/parseTheory'
import type { Theory, TheoryField } from '../shared/schemas/theory'
import { gaugeBetaCoefficients, gaugeContentOf, gaugeRunningReport, runGaugeCouplings, towerGaugeContent } from '../server/engine/running/gauge/index'
import { ALPHA_S_MZ, Z_MASS_GEV } from '../server/engine/scales/pdg2024'
import { medianTime } from './support/timing'

const SM = parseTheory(smeft)
const SM_ALPHA = { colour: ALPHA_S_MZ, weak: 0.0338, hypercharge: 0.0102 }

function qcd(quarks: string[]): Theory {
  const fields: TheoryField[] = quarks.flatMap((q) => [
    { name: q, lorentz: 'left-weyl', reps: { colour: [1, 0] } },
    { name: `${q}R`, lorentz: 'right-weyl', reps: { colour: [1, 0] } },
  ])
  return parseTheory({ name: `QCD${quarks.length}`, frame: 'relativistic', groups: [{ name: 'colour', type: 'SU', n: 3, gauge: true }], fields })
}

/** The Standard Model with two more U(1)s (B−L and a dark D) and fields charged under several of them. */
function threeU1s(): Theory {
  const bl: Record<string, string> = { Q: '1/3', u: '1/3', d: '1/3', L: '-1', e: '-1' }
  const fields = SM.fields.map((f) => (bl[f.name] ? { ...f, charges: { ...f.charges, BL: bl[f.name]! } } : f))
  return parseTheory({
    name: 'SM x U(1)BL x U(1)D',
    frame: 'relativistic',
    groups: [...SM.groups, { name: 'BL', type: 'U1', gauge: true }, { name: 'D', type: 'U1', gauge: true }],
    fields: [
      ...fields,
      { name: 'nu', lorentz: 'right-weyl', charges: { BL: '-1' }, flavors: 3 },
      { name: 'Phi', lorentz: 'scalar', charges: { BL: '2', D: '1' } },
      { name: 'psi', lorentz: 'left-weyl', reps: { weak: [1] }, charges: { hypercharge: '1/2', D: '1' } },
      { name: 'psiR', lorentz: 'right-weyl', reps: { weak: [1] }, charges: { hypercharge: '1/2', D: '1' } },
    ],
  })
}

export default async function gaugeBench(): Promise<Record<string, number | Record<string, unknown>>> {
  const sm = gaugeContentOf(SM)
  const report = (loops: 1 | 2) => gaugeRunningReport(sm, { loops, muFromGeV: Z_MASS_GEV, alpha: SM_ALPHA, plotFromGeV: 1, plotToGeV: 1e19, muToGeV: 1e16 })
  const names = ['u', 'd', 's', 'c', 'b', 't']
  const tower = towerGaugeContent([
    { theory: qcd(names), thresholdGeV: null },
    { theory: qcd(names.slice(0, 5)), thresholdGeV: 172.57 },
    { theory: qcd(names.slice(0, 4)), thresholdGeV: 4.183 },
    { theory: qcd(names.slice(0, 3)), thresholdGeV: 1.273 },
  ])
  const mixed = gaugeContentOf(threeU1s())
  let points = 0
  const mixedRun = medianTime(5, () => {
    const r = runGaugeCouplings({
      content: mixed,
      loops: 2,
      muFromGeV: 1e3,
      muToGeV: 1e-3 * 1e22,
      alpha: { ...SM_ALPHA, BL: 0.005, D: 0.005 },
      mixing: [{ groups: ['hypercharge', 'D'], epsilon: 0.01 }],
    })
    points = r.points.length
  })
  return {
    sm_exact_coefficients: medianTime(20, () => gaugeBetaCoefficients(sm)),
    sm_report_1loop_1GeV_to_1e19: medianTime(10, () => report(1)),
    sm_report_2loop_1GeV_to_1e19: medianTime(10, () => report(2)),
    qcd_tower_2loop_MZ_to_1_5GeV_and_10TeV: medianTime(10, () => {
      runGaugeCouplings({ content: tower, loops: 2, muFromGeV: Z_MASS_GEV, muToGeV: 1.5, alpha: { colour: ALPHA_S_MZ } })
      runGaugeCouplings({ content: tower, loops: 2, muFromGeV: Z_MASS_GEV, muToGeV: 1e4, alpha: { colour: ALPHA_S_MZ } })
    }),
    three_u1_mixing_2loop_1TeV_to_1e19: { median_ms: mixedRun, steps: points },
  }
}
