// The running of a theory's own gauge couplings as it travels from the engine to the page
// (the engine's report has exactly these types). Scales in GeV; exact coefficients as strings.

/** Couplings at one scale: 1/α per group (theory order) and the kinetic mixing ε per pair of U(1)s. */
export interface GaugeCouplingValues {
  alphaInverse: number[]
  epsilon: number[]
}

/** A point of a running: the scale, the segment between thresholds it lies in, the couplings. */
export interface GaugeRunPoint extends GaugeCouplingValues {
  mu: number
  segment: number
}

/** Where a running stopped because a coupling passed 4π, in words. */
export interface GaugeRunStop {
  group: string
  muGeV: number
  direction: 'up' | 'down'
  message: string
}

/** A term of d y_T/d ln μ = −(1/2π)[b_T + (1/4π) Σ_c B_Tc α_c] involving a mixed pair of U(1)s; `coupling` null is b_T. */
export interface MixingTerm {
  target: string
  coupling: string | null
  value: string
}

/** The exact coefficients of one range of μ between thresholds. */
export interface CoefficientTable {
  /** Range of μ in GeV; null below the lightest and above the heaviest threshold. */
  lowGeV: number | null
  highGeV: number | null
  active: string[]
  /** b_i, group order. */
  oneLoop: string[]
  /** B_ij, group × group. */
  twoLoop: string[][]
  /** With two or more U(1)s: whether running mixes them from none, and the non-zero mixing terms. */
  mixing: { generated: boolean; terms: MixingTerm[] } | null
}

export interface GaugeGroupLabel {
  name: string
  label: string
  abelian: boolean
}
export interface GaugeTableRow extends GaugeRunPoint {
  label: string
}

export interface GaugeReport {
  groups: GaugeGroupLabel[]
  pairs: [string, string][]
  loops: 1 | 2
  curve: GaugeRunPoint[]
  table: GaugeTableRow[]
  stops: GaugeRunStop[]
  segments: CoefficientTable[]
  assumptions: string[]
  caution: string
}

/** What the couplings page starts from (GET /api/theories/:id/gauge-running). */
export interface GaugeRunningInputs {
  theoryId: number
  role: string
  chain: { id: number; name: string; thresholdGeV: number | null }[]
  note: string | null
  problem: string | null
  groups: GaugeGroupLabel[]
  multiplets: { name: string; kind: 'weyl' | 'complex-scalar' | 'real-scalar'; flavors: number; massGeV: number; theory: string }[]
  defaults: { loops: 1 | 2; muFromGeV: number; alpha: Record<string, number>; plotFromGeV: number; plotToGeV: number; source: string } | null
  assumptions: string[]
}
