/** Public API of the theory model (species of a theory file) and the gauge-anomaly check. */
export { buildTheoryModel, adjoint, type LorentzType, type Species, type TheoryModel } from './model'
export { anomalyConditions, checkAnomalies, type AnomalyCondition } from './anomalies'
export { parseTheory } from './parseTheory'
