/**
 * The building blocks of the chiral Lagrangian of SU(N)_L × SU(N)_R / SU(N)_V, with the data the
 * counting needs. With u² = U, u_μ = i[u†(∂_μ − i r_μ)u − u(∂_μ − i l_μ)u†],
 * χ_± = u†χu† ± uχ†u (χ = 2B(s + ip)), f_±μν = u F_Lμν u† ± u† F_Rμν u; all transform as
 * X ↦ h X h† under the unbroken SU(N)_V.
 *
 * Discrete symmetries (Bijnens, Colangelo, Ecker, Ann. Phys. 280 (2000) 100, table 1):
 *   block   P               C                 h.c.
 *   u_μ     −u^μ            +u_μ^T            +u_μ
 *   χ_+     +χ_+            +χ_+^T            +χ_+
 *   χ_−     −χ_−            +χ_−^T            −χ_−
 *   f_+μν   +f_+^{μν}       −f_+μν^T          +f_+μν
 *   f_−μν   −f_−^{μν}       +f_−μν^T          +f_−μν
 * "intrinsic parity" is the P sign without the Lorentz-index part; P-even terms with an odd
 * intrinsic parity carry one ε^{μνρσ} (the odd-intrinsic-parity or anomalous sector).
 */
import type { FlavorKind } from './flavorModels'
import type { TowerKind } from './towers'

export type BlockName = 'u' | 'chi+' | 'chi-' | 'f+' | 'f-' | 'v'

export interface Block {
  name: BlockName
  /** Plain-text symbol used in class keys. */
  symbol: string
  tower: TowerKind
  /** 'sl': traceless N × N (adjoint of SU(N)); 'gl': any N × N matrix (adjoint plus singlet);
   *  for O(N): 'vector', 'adjoint' (antisymmetric N × N), 'singlet'. */
  flavor: FlavorKind
  /** Intrinsic parity: the sign under P without the index reflection. */
  parity: 1 | -1
  /** Sign under charge conjugation (which also transposes the matrix). */
  charge: 1 | -1
  /** Sign under Hermitian conjugation (which also reverses products). */
  hermitian: 1 | -1
  /** The external sources the block needs: scalar (s, p), vector (l_μ, r_μ), the singlet vector v_μ^(s), or none. */
  source: 'scalar' | 'vector' | 'singletVector' | null
}

/**
 * Which external sources a theory has. singletVector: the U(1)_V part of the vector source,
 * v_μ^(s) = ⟨r_μ + l_μ⟩/(2N) (the quark-number current's source; the photon's for N = 2, whose
 * charge matrix is not traceless). It enters only through its field strength v_μν, a flavor
 * singlet with C = −1 (Ebertshäuser, Fearing, Scherer, Phys. Rev. D 65 (2002) 054033, the U(1)_V
 * extension; Bijnens, Girlanda, Talavera, Eur. Phys. J. C 23 (2002) 539).
 */
export interface SourceSwitch {
  scalar: boolean
  vector: boolean
  singletVector?: boolean
}

/** Normalize the sources option: true/false switches both. */
export function sourceSwitch(s: boolean | SourceSwitch): SourceSwitch {
  return typeof s === 'boolean' ? { scalar: s, vector: s } : { scalar: s.scalar, vector: s.vector, singletVector: s.singletVector === true }
}

/** Whether a block exists with these sources. */
export function blockPresent(b: Block, s: SourceSwitch): boolean {
  return b.source === null || s[b.source] === true
}

export const BLOCKS: readonly Block[] = [
  { name: 'u', symbol: 'u', tower: 'goldstone', flavor: 'sl', parity: -1, charge: 1, hermitian: 1, source: null },
  { name: 'chi+', symbol: 'χ+', tower: 'source', flavor: 'gl', parity: 1, charge: 1, hermitian: 1, source: 'scalar' },
  { name: 'chi-', symbol: 'χ−', tower: 'source', flavor: 'gl', parity: -1, charge: 1, hermitian: -1, source: 'scalar' },
  { name: 'f+', symbol: 'f+', tower: 'strength', flavor: 'sl', parity: 1, charge: -1, hermitian: 1, source: 'vector' },
  { name: 'f-', symbol: 'f−', tower: 'strength', flavor: 'sl', parity: -1, charge: 1, hermitian: 1, source: 'vector' },
  { name: 'v', symbol: 'v', tower: 'strength', flavor: 'singlet', parity: 1, charge: -1, hermitian: 1, source: 'singletVector' },
]

/** Blocks used by a count: the Goldstone block always, the source blocks when their sources are on. */
export function activeBlocks(sources: boolean | SourceSwitch): Block[] {
  const s = sourceSwitch(sources)
  return BLOCKS.filter((b) => blockPresent(b, s))
}

/**
 * Building blocks of O(N+1)/O(N) with an O(N+1) vector source χ^A and gauge source F^{AB}:
 * under the unbroken O(N), u_μ and χ_− (the components of χ orthogonal to the vacuum) are vectors,
 * χ_+ (the component along it) a singlet, F splits into f_+ (Λ²V, the unbroken generators) and
 * f_− (V, the broken ones). −1 ∈ O(N) plays the role of intrinsic parity, so every invariant has
 * an even number of vectors, and the theory has no charge conjugation beyond O(N+1) itself.
 * Reference: Gasser & Leutwyler, Ann. Phys. 158 (1984) 142, sect. 4–5 (the O(4) form of the
 * two-flavour case); Hasenfratz & Leutwyler, Nucl. Phys. B 343 (1990) 241 (general N).
 */
export const ORTHOGONAL_BLOCKS: readonly Block[] = [
  { name: 'u', symbol: 'u', tower: 'goldstone', flavor: 'vector', parity: -1, charge: 1, hermitian: 1, source: null },
  { name: 'chi+', symbol: 'χ+', tower: 'source', flavor: 'singlet', parity: 1, charge: 1, hermitian: 1, source: 'scalar' },
  { name: 'chi-', symbol: 'χ−', tower: 'source', flavor: 'vector', parity: -1, charge: 1, hermitian: 1, source: 'scalar' },
  { name: 'f+', symbol: 'f+', tower: 'strength', flavor: 'adjoint', parity: 1, charge: 1, hermitian: 1, source: 'vector' },
  { name: 'f-', symbol: 'f−', tower: 'strength', flavor: 'vector', parity: -1, charge: 1, hermitian: 1, source: 'vector' },
]

/** Source-only letters of O(N+1) (contact terms): the vector χ^A and the field strength F^{AB}. */
export const ORTHOGONAL_SOURCE_BLOCKS: readonly Block[] = [
  { name: 'chi+', symbol: 'χ', tower: 'source', flavor: 'vector', parity: 1, charge: 1, hermitian: 1, source: 'scalar' },
  { name: 'f+', symbol: 'F', tower: 'strength', flavor: 'adjoint', parity: 1, charge: 1, hermitian: 1, source: 'vector' },
]
