/**
 * The flavor part of the coset Hilbert series, per unbroken group H: the (signed) number of
 * H-singlets in a product of letters raised to cycle lengths, with or without charge conjugation.
 *   UnitaryFlavor     H = SU(N)_V on N × N matrices: 'sl' (traceless) and 'gl' letters; C transposes.
 *   OrthogonalFlavor  H = O(N): 'vector', 'adjoint' (Λ²V) and 'singlet' letters; no C of its own
 *                     (the twisted trace equals the untwisted one, so every term is C-even).
 */
import { orthogonalSinglets, type OrthogonalRep } from './orthogonalIntegral'
import { adjointSinglets, twistedAdjointSinglets, withTracesRemoved } from './unitaryIntegral'

export type FlavorKind = 'sl' | 'gl' | 'vector' | 'adjoint' | 'singlet'

export interface FlavorCycle {
  kind: FlavorKind
  cycle: number
}

export interface FlavorIntegrator {
  /** ∫_H Π_i χ_{kind_i}(h^{c_i}) (chargeTwist: with C applied to every letter, signs excluded). */
  singlets(cycles: readonly FlavorCycle[], chargeTwist: boolean): number
}

/** H = SU(N)_V acting by conjugation (N = GENERAL_N: no trace relations). */
export class UnitaryFlavor implements FlavorIntegrator {
  private readonly cache = new Map<string, number>()
  constructor(readonly N: number) {}
  singlets(cycles: readonly FlavorCycle[], chargeTwist: boolean): number {
    const gl = cycles
      .filter((x) => x.kind === 'gl')
      .map((x) => x.cycle)
      .sort()
    const sl = cycles
      .filter((x) => x.kind === 'sl')
      .map((x) => x.cycle)
      .sort()
    const key = `${chargeTwist ? 't' : 'u'}|${gl.join(',')}|${sl.join(',')}`
    let hit = this.cache.get(key)
    if (hit === undefined) {
      const f = chargeTwist ? (nu: number[]) => twistedAdjointSinglets(this.N, nu) : (nu: number[]) => adjointSinglets(this.N, nu)
      hit = withTracesRemoved(gl, sl, f)
      this.cache.set(key, hit)
    }
    return hit
  }
}

/** H = O(N), both components. */
export class OrthogonalFlavor implements FlavorIntegrator {
  private readonly cache = new Map<string, number>()
  constructor(readonly N: number) {}
  singlets(cycles: readonly FlavorCycle[]): number {
    const factors = cycles.filter((x) => x.kind !== 'singlet').map((x) => ({ rep: x.kind as OrthogonalRep, cycle: x.cycle }))
    const key = factors
      .map((f) => `${f.rep}${f.cycle}`)
      .sort()
      .join(' ')
    let hit = this.cache.get(key)
    if (hit === undefined) {
      hit = orthogonalSinglets(this.N, factors)
      this.cache.set(key, hit)
    }
    return hit
  }
}
