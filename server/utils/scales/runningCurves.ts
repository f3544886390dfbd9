import { runAlphaS, type AlphaSTracePoint, type RunAlphaSInput } from '../../engine/running/runAlphaS'
import { runAlphaQED } from '../../engine/running/runAlphaQED'
import { alphaQedAtZ } from '../../engine/running/alphaQedAtZ'
import { CHARGED_LEPTONS, QED_FERMIONS } from '../../engine/running/qedFermions'
import { RUNNING_CAUTION } from '../../engine/running/caution'
import { TAU_MASS_GEV, Z_MASS_GEV } from '../../engine/scales/pdg2024'
import { toString as ratText } from '../../engine/exact/rational'
import type { RunningQcdRequest, RunningQedRequest } from '../../../shared/schemas/scaleRequests'

/** Keep at most `max` points of a curve, evenly spaced in index, always keeping the ends and n_f jumps. */
function thin<T extends { nf?: number }>(points: T[], max: number): T[] {
  if (points.length <= max) return points
  const step = points.length / max
  return points.filter((p, i) => i === 0 || i === points.length - 1 || Math.floor(i / step) !== Math.floor((i - 1) / step) || p.nf !== points[i - 1]!.nf)
}

/**
 * α_s at muTo, a curve over [plotFrom, plotTo] (run from muFrom both ways), and a table at
 * familiar scales (thresholds, m_τ, M_Z) inside the plotted range.
 */
export function qcdRunning(req: RunningQcdRequest) {
  const { muTo, plotFrom, plotTo, ...rest } = req
  const base: Omit<RunAlphaSInput, 'muTo'> = { ...rest, loops: rest.loops as 1 | 2 | 3 | 4 }
  const { trace: _t, ...result } = runAlphaS({ ...base, muTo })
  const lo = Math.min(plotFrom ?? 1, muTo, req.muFrom)
  const hi = Math.max(plotTo ?? 1000, muTo, req.muFrom)
  const down = runAlphaS({ ...base, muTo: lo })
  const up = runAlphaS({ ...base, muTo: hi })
  const curve: AlphaSTracePoint[] = [...down.trace.slice(1).reverse(), ...up.trace]
  const marks = [...req.thresholds.map((t) => ({ label: `m_${t.name}`, mu: t.mass })), { label: 'm_τ', mu: TAU_MASS_GEV }, { label: 'M_Z', mu: Z_MASS_GEV }, { label: 'μ (chosen)', mu: muTo }]
  const table = marks
    .filter((m) => m.mu >= lo && m.mu <= hi)
    .sort((a, b) => a.mu - b.mu)
    .map((m) => {
      const r = runAlphaS({ ...base, muTo: m.mu })
      return { label: m.label, mu: m.mu, alphaS: r.alphaS, nf: r.nfTo }
    })
  return { result, curve: thin(curve, 400), crossings: [...down.crossings, ...up.crossings], table, plotRange: [lo, hi], caution: RUNNING_CAUTION }
}

/** One-loop α(μ) through the charged-fermion thresholds, and α(M_Z) with the hadronic shift as an input. */
export function qedRunning(req: RunningQedRequest) {
  const fermions = req.quarks ? QED_FERMIONS : CHARGED_LEPTONS
  const run = runAlphaQED({ muTo: req.muTo, alphaInverse0: req.alphaInverse0, fermions, pointsPerSegment: 12 })
  const atZ = req.deltaAlphaHad5 === undefined ? null : alphaQedAtZ({ deltaAlphaHad5: req.deltaAlphaHad5, alphaInverse0: req.alphaInverse0 })
  return {
    run,
    atZ,
    fermions: fermions.map((f) => ({ name: f.name, mass: f.mass, charge: ratText(f.charge), colours: f.colours, source: f.source })),
    caution: RUNNING_CAUTION,
  }
}

/** The inputs the couplings page starts from (PDG 2024 and CODATA 2018 values of the engine). */
export { ALPHA_S_MZ, BOTTOM_MSBAR_MASS_GEV, CHARM_MSBAR_MASS_GEV, TOP_POLE_MASS_GEV, Z_MASS_GEV } from '../../engine/scales/pdg2024'
