/**
 * Running of a theory's own gauge couplings (any product of SU(N) groups and U(1)s, kinetic
 * mixing of the U(1)s included) at one and two loops, through the thresholds of its tower.
 */
export { simpleGroupFactors, hasRunningCoupling, type SimpleGroupFactors } from './groupFactors'
export { gaugeContentOf, towerGaugeContent, type GaugeContent, type GaugeGroupInfo, type GaugeMultiplet, type MatterKind, type TowerStep } from './gaugeContent'
export { contentFactors, LOOP_WEIGHTS, type ContentFactors, type FieldFactors } from './fieldFactors'
export { gaugeBetaCoefficients, MAX_ABELIAN_GROUPS, type CouplingSlot, type GaugeBetaCoefficients } from './betaCoefficients'
export { runningSegments, segmentIndexAt, type RunningSegment } from './segments'
export { gaugeFlow, inverseSpd, perturbativeMargins, slotAlphas, slotLayout, type SlotLayout } from './gaugeFlow'
export { MU_RANGE_GEV, readCouplings, startState, type GaugeCouplingValues, type GaugeRunInput, type KineticMixingInput } from './gaugeRunInput'
export { formatGeV, gaugeCouplingsAt, runGaugeCouplings, type GaugeCouplingsAt, type GaugeRunPoint, type GaugeRunResult, type GaugeRunStop } from './runGaugeCouplings'
export { coefficientTable, type CoefficientTable, type MixingTerm } from './coefficientTable'
export { GAUGE_RUNNING_ASSUMPTIONS, gaugeRunningReport, runningGroupList, type GaugeReport, type GaugeReportRequest, type GaugeTableRow } from './report'
