/**
 * Which engine code a basis's stored fingerprints came from. A fingerprint is only comparable
 * with another taken at the same sample points modulo the same primes, and the points are
 * fixed by code (the seeds in classBasis.ts, the number of points, the kinematics and
 * wave-functions of evaluation.ts, the working primes of finite/primeSet.ts). Every stored
 * basis records FINGERPRINT_VERSION in `bases.fingerprint_version`.
 *
 * What a version changes:
 * - Stored against stored (coverage, moves, rewrites of set-aside operators): never affected;
 *   all fingerprints of one basis come from one run, hence one version.
 * - A typed operator is fingerprinted by the current code. When the current code reproduces
 *   the basis's sample points (its version is listed in REPRODUCED_VERSIONS) it is compared
 *   with the stored kept fingerprints; otherwise the class is recomputed and the kept
 *   operators are fingerprinted again from their texts beside the typed one.
 * - Bases stored before the version was recorded hold null and are read as version 1: the
 *   sampling code has not changed since fingerprints were first stored.
 *
 * Bump FINGERPRINT_VERSION whenever sampling or evaluation changes, and drop the versions the
 * new code no longer reproduces from REPRODUCED_VERSIONS.
 */
export const FINGERPRINT_VERSION = 1

/** The version of a basis stored before versions were recorded (a null column). */
export const UNRECORDED_FINGERPRINT_VERSION = 1

/** Versions whose sample points the current code reproduces exactly. */
const REPRODUCED_VERSIONS: ReadonlySet<number> = new Set([1])

/** The version a stored basis's fingerprints came from. @example storedFingerprintVersion(null) // 1 */
export function storedFingerprintVersion(column: number | null | undefined): number {
  return column ?? UNRECORDED_FINGERPRINT_VERSION
}

/** True when the current code places a class's points exactly as the given version did. */
export function reproducesStoredPoints(column: number | null | undefined): boolean {
  return REPRODUCED_VERSIONS.has(storedFingerprintVersion(column))
}

export interface TypedRewritePlan {
  /** Operator texts to fingerprint now, the typed one last. */
  texts: string[]
  /** Compare with the stored kept fingerprints (else with the first texts.length − 1 fingerprinted now). */
  useStored: boolean
}

/**
 * What to fingerprint to rewrite a typed operator onto the kept operators of a stored basis.
 * @example typedRewritePlan(null, ['<12>[12]'], '2 <12>[12]') // { texts: ['2 <12>[12]'], useStored: true }
 * @example typedRewritePlan(7, ['<12>[12]'], '2 <12>[12]') // { texts: ['<12>[12]', '2 <12>[12]'], useStored: false }
 */
export function typedRewritePlan(column: number | null | undefined, keptTexts: readonly string[], typed: string): TypedRewritePlan {
  if (reproducesStoredPoints(column)) return { texts: [typed], useStored: true }
  return { texts: [...keptTexts, typed], useStored: false }
}
