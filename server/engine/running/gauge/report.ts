/**
 * Everything the couplings page shows for a theory's own gauge couplings: curves over a range
 * of μ run from the input scale both ways, the couplings at the thresholds and at a chosen
 * scale, where the running stops, and the exact coefficients of every segment.
 */
import { EngineInputError } from '../../errors'
import { RUNNING_CAUTION } from '../caution'
import type { GaugeContent } from './gaugeContent'
import { simpleGroupFactors } from './groupFactors'
import type { GaugeRunInput } from './gaugeRunInput'
import { runGaugeCouplings, type GaugeRunPoint, type GaugeRunStop } from './runGaugeCouplings'
import { coefficientTable } from './coefficientTable'
import type { GaugeReport, GaugeTableRow } from '../../../../shared/types/gaugeRunning'

export interface GaugeReportRequest {
  loops: 1 | 2
  muFromGeV: number
  alpha: Record<string, number>
  mixing?: GaugeRunInput['mixing']
  plotFromGeV: number
  plotToGeV: number
  /** A scale whose couplings are wanted in the table (optional). */
  muToGeV?: number
}

export type { GaugeReport, GaugeTableRow }

/** What the numbers assume, stated beside them. */
export const GAUGE_RUNNING_ASSUMPTIONS: readonly string[] = [
  'MS-bar gauge β functions at one or two loops (Machacek & Vaughn 1983); U(1) coefficients use the charges as written (no GUT normalisation).',
  'Yukawa couplings are not part of a theory file, so their two-loop contribution is left out (in the Standard Model the top-quark Yukawa term is the largest of these).',
  'Fields decouple as step functions at the masses of the tower; the couplings are continuous there (MS-bar one-loop matching of heavy fermions and scalars at μ = m).',
  'Several U(1)s mix kinetically as they run (coupling-matrix form); ε is the kinetic mixing with canonically normalised field strengths.',
  'A heavy-frame particle is static and does not run; field strengths are not matter.',
]

/** The running groups as the page names them. @example runningGroupList(gaugeContentOf(smeft))[0] // { name: 'colour', label: 'SU(3)', abelian: false } */
export function runningGroupList(content: GaugeContent): GaugeReport['groups'] {
  return content.groups.map((g) => ({ name: g.name, label: g.abelian ? 'U(1)' : simpleGroupFactors(g.group).label, abelian: g.abelian }))
}

/** Keep at most `max` points, always the ends and the segment changes. */
function thin(points: GaugeRunPoint[], max: number): GaugeRunPoint[] {
  if (points.length <= max) return points
  const step = points.length / max
  return points.filter((p, i) => i === 0 || i === points.length - 1 || Math.floor(i / step) !== Math.floor((i - 1) / step) || p.segment !== points[i - 1]!.segment)
}

/** Rows at the input scale, the thresholds inside the plotted range (points of the legs) and the chosen scale. */
function tableRows(content: GaugeContent, legs: GaugeRunPoint[], chosen: GaugeRunPoint | null, req: GaugeReportRequest): GaugeTableRow[] {
  const rows = new Map<number, GaugeTableRow>()
  const mark = (p: GaugeRunPoint | undefined, label: string) => {
    if (!p) return
    const row = rows.get(p.mu)
    rows.set(p.mu, row ? { ...row, label: row.label.includes(label) ? row.label : `${row.label}, ${label}` } : { ...p, label })
  }
  mark(
    legs.find((p) => p.mu === req.muFromGeV),
    'input scale',
  )
  for (const m of content.multiplets)
    if (m.massGeV > 0)
      mark(
        legs.find((p) => p.mu === m.massGeV),
        `threshold of ${m.name}`,
      )
  if (chosen) mark(chosen, 'chosen scale')
  return [...rows.values()].sort((a, b) => a.mu - b.mu)
}

/** Each stop once: a chosen scale beyond the plotted range may stop where a leg did not reach. */
function distinctStops(stops: (GaugeRunStop | undefined)[]): GaugeRunStop[] {
  const out: GaugeRunStop[] = []
  for (const s of stops) if (s && !out.some((o) => o.direction === s.direction)) out.push(s)
  return out
}

/**
 * The page's report for a theory's gauge content.
 * @example gaugeRunningReport(gaugeContentOf(darkU1), { loops: 2, muFromGeV: 1, alpha: { X: 0.01 }, plotFromGeV: 1e-3, plotToGeV: 1e19 }).stops
 *   // [{ group: 'X', direction: 'up', message: 'g_X grows beyond 4π above μ ≈ … GeV: …' }] when the pole lies in range
 * Method: runGaugeCouplings from the input scale up to plotTo and down to plotFrom, and to each table scale.
 * Reference: Machacek & Vaughn, Nucl. Phys. B 222 (1983) 83.
 */
export function gaugeRunningReport(content: GaugeContent, req: GaugeReportRequest, signal?: GaugeRunInput['signal']): GaugeReport {
  if (content.groups.length === 0) throw new EngineInputError('gaugeRunningReport', 'This theory has no gauge group whose coupling runs (SU(N) or U(1) with gauge true).')
  if (!(req.plotFromGeV < req.plotToGeV))
    throw new EngineInputError('gaugeRunningReport', `The plotted range must go from a lower to a higher scale, not from ${req.plotFromGeV} to ${req.plotToGeV} GeV.`)
  const marks = req.muToGeV === undefined ? [] : [req.muToGeV]
  const base = { content, loops: req.loops, muFromGeV: req.muFromGeV, alpha: req.alpha, mixing: req.mixing, marks, signal }
  const up = runGaugeCouplings({ ...base, muToGeV: Math.max(req.plotToGeV, req.muFromGeV) })
  const down = runGaugeCouplings({ ...base, muToGeV: Math.min(req.plotFromGeV, req.muFromGeV) })
  const inLegs = [...down.points, ...up.points].find((p) => p.mu === req.muToGeV)
  const chosen = req.muToGeV === undefined || inLegs ? null : runGaugeCouplings({ ...base, muToGeV: req.muToGeV })
  return {
    groups: runningGroupList(content),
    pairs: up.pairs,
    loops: req.loops,
    curve: thin([...down.points.slice(1).reverse(), ...up.points], 600),
    table: tableRows(content, [...down.points, ...up.points], inLegs ?? (chosen && !chosen.stop ? chosen.end : null), req),
    stops: distinctStops([down.stop, up.stop, chosen?.stop]),
    segments: up.segments.map(coefficientTable),
    assumptions: [...GAUGE_RUNNING_ASSUMPTIONS],
    caution: RUNNING_CAUTION,
  }
}
