/** Explicit operator bases from on-shell amplitudes over prime fields. */
export { classBasis, BASIS_NOTE, type ClassBasis, type ClassOptions, type Priorities } from './classBasis'
export { rewriteOperator, type RewriteResult, type AmplitudeTarget } from './rewrite'
export { parseOperatorText, formatLorentz } from './inputSyntax'
export { theoryParticles, type Particle } from './particles'
export { parseClassKey, classKeyOf, type OperatorClass } from './classKey'
export { randomKinematics, type KinematicPoint } from './kinematics'
export { buildBasis, type BuildOptions, type BasisReport, type ClassReport, type DimensionReport } from './buildBasis'
export type { BasisOperator } from './describe'
