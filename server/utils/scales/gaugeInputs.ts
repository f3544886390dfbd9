import { towerGaugeContent, type GaugeContent, type TowerStep } from '../../engine/running/gauge/gaugeContent'
import { GAUGE_RUNNING_ASSUMPTIONS, runningGroupList } from '../../engine/running/gauge/report'
import { alphaQedAtZ } from '../../engine/running/alphaQedAtZ'
import { ALPHA_S_MZ, Z_MASS_GEV } from '../../engine/scales/pdg2024'
import { toString as ratText } from '../../engine/exact/rational'

/** sin²θ̂_W(M_Z) in MS-bar, 0.23129 (PDG 2024 electroweak review; from memory). */
const SIN2_THETA_MSBAR_MZ = 0.23129
/** Δα_had^(5)(M_Z²) = 0.02783 (PDG 2024 electroweak review; from memory), as on the QED panel. */
const DELTA_ALPHA_HAD5 = 0.02783

/**
 * The Standard Model's three gauge groups, recognised by their kinds and a colourless complex
 * doublet of hypercharge ±1/2 (the Higgs, which fixes the hypercharge normalisation): then
 * the groups' names in the order colour, weak, hypercharge.
 */
function standardModelGroups(c: GaugeContent): [string, string, string] | null {
  const kind = (g: GaugeContent['groups'][number]) => (g.abelian ? 'U1' : `SU${g.group.n}`)
  const by = (k: string) => c.groups.filter((g) => kind(g) === k)
  const [colour, weak, hyper] = [by('SU3'), by('SU2'), by('U1')]
  if (c.groups.length !== 3 || colour.length !== 1 || weak.length !== 1 || hyper.length !== 1) return null
  const [C, W, Y] = [colour[0]!.name, weak[0]!.name, hyper[0]!.name]
  const higgs = c.multiplets.some((m) => m.kind === 'complex-scalar' && !m.reps[C]?.some((a) => a > 0) && m.reps[W]?.[0] === 1 && ['1/2', '-1/2'].includes(m.charges[Y] ? ratText(m.charges[Y]) : ''))
  return higgs ? [C, W, Y] : null
}

function defaultInputs(c: GaugeContent) {
  const sm = standardModelGroups(c)
  const masses = c.multiplets.map((m) => m.massGeV).filter((m) => m > 0)
  const plotFromGeV = Math.min(1, ...masses.map((m) => m / 10))
  const plotToGeV = Math.max(1e19, ...masses.map((m) => m * 10))
  if (sm) {
    const alphaHat = 1 / alphaQedAtZ({ deltaAlphaHad5: DELTA_ALPHA_HAD5 }).msbar.alphaInverse
    const alpha = { [sm[0]]: ALPHA_S_MZ, [sm[1]]: alphaHat / SIN2_THETA_MSBAR_MZ, [sm[2]]: alphaHat / (1 - SIN2_THETA_MSBAR_MZ) }
    const source = `Standard-Model inputs at M_Z (MS-bar): α_s = ${ALPHA_S_MZ} (PDG 2024 world average); α_2 = α̂/sin²θ̂ and α_Y = α̂/cos²θ̂ with α̂(M_Z)⁻¹ = 127.93 (from Δα_had⁽⁵⁾ = ${DELTA_ALPHA_HAD5}) and sin²θ̂_W = ${SIN2_THETA_MSBAR_MZ} (PDG 2024 electroweak review; from memory). Hypercharge as written (α_1 = (5/3) α_Y in GUT normalisation).`
    return { loops: 2 as const, muFromGeV: Z_MASS_GEV, alpha, plotFromGeV, plotToGeV, source }
  }
  const alpha = Object.fromEntries(c.groups.map((g) => [g.name, g.abelian ? 0.01 : 0.1]))
  return {
    loops: 2 as const,
    muFromGeV: Z_MASS_GEV,
    alpha,
    plotFromGeV,
    plotToGeV,
    source: 'Placeholder inputs (α = 0.1 for SU(N), 0.01 for U(1) at M_Z): replace them with the values of your model.',
  }
}

/**
 * What the couplings page needs before any running: the running groups with their labels,
 * the matter with the masses of the tower, suggested inputs and what the running assumes.
 */
export function gaugeRunningInputs(steps: readonly TowerStep[]) {
  const c = towerGaugeContent(steps)
  return {
    groups: runningGroupList(c),
    multiplets: c.multiplets.map((m) => ({ name: m.name, kind: m.kind, flavors: m.flavors, massGeV: m.massGeV, theory: m.theory })),
    defaults: c.groups.length ? defaultInputs(c) : null,
    assumptions: [...GAUGE_RUNNING_ASSUMPTIONS],
  }
}
