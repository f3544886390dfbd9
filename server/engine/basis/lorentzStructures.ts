/**
 * Lorentz structures of a class: spinor-bracket monomials Π⟨ij⟩ Π[ij] whose little-group
 * weights match the legs, for every distribution of the class's k derivatives over the
 * legs (a derivative on leg i adds one λ_i and one λ̃_i).
 */
import { EngineConsistencyError } from '../errors'

export interface LorentzStructure {
  /** Derivatives on each leg. */
  derivs: number[]
  /** Angle brackets ⟨ij⟩ with i < j (0-based legs), repeated for powers. */
  angle: [number, number][]
  /** Square brackets [ij] with i < j. */
  square: [number, number][]
}

/**
 * All compositions of `total` into `parts` non-negative integers (lexicographic).
 * @example compositions(2, 2) // [[2,0],[1,1],[0,2]]
 */
export function compositions(total: number, parts: number): number[][] {
  if (parts === 0) return total === 0 ? [[]] : []
  const out: number[][] = []
  for (let first = total; first >= 0; first--) {
    for (const rest of compositions(total - first, parts - 1)) out.push([first, ...rest])
  }
  return out
}

/**
 * All loop-free multigraphs with the given vertex degrees, as edge lists (i < j).
 * @example bracketGraphs([1, 1, 1, 1]).length // 3: ⟨12⟩⟨34⟩, ⟨13⟩⟨24⟩, ⟨14⟩⟨23⟩
 * Method: recursive distribution of the lowest vertex's degree. Reference: common practice.
 */
export function bracketGraphs(degrees: number[]): [number, number][][] {
  const out: [number, number][][] = []
  const rem = degrees.slice()
  const edges: [number, number][] = []
  const total = degrees.reduce((a, b) => a + b, 0)
  if (total % 2 !== 0) return out
  const rec = (i: number): void => {
    while (i < rem.length && rem[i] === 0) i++
    if (i >= rem.length) {
      out.push(edges.slice())
      return
    }
    distribute(i, i + 1, rem[i]!, () => rec(i + 1))
  }
  const distribute = (i: number, j: number, left: number, done: () => void): void => {
    if (left === 0) {
      const save = rem[i]!
      rem[i] = 0
      done()
      rem[i] = save
      return
    }
    if (j >= rem.length) return
    const max = Math.min(left, rem[j]!)
    for (let m = max; m >= 0; m--) {
      rem[j] = rem[j]! - m
      for (let r = 0; r < m; r++) edges.push([i, j])
      distribute(i, j + 1, left - m, done)
      for (let r = 0; r < m; r++) edges.pop()
      rem[j] = rem[j]! + m
    }
  }
  rec(0)
  return out
}

/**
 * Every Lorentz structure for legs with base spinor counts (angles[i], squares[i]) and k
 * derivatives in total.
 * @example lorentzStructures([2,2,2], [0,0,0], 0).length // 1: ⟨12⟩⟨23⟩⟨31⟩ (F_L^3)
 * Method: Shadmi & Weiss, JHEP 02 (2019) 165; Ma, Shu & Xiao, PRD 100 (2019) 016011 —
 * amplitude–operator correspondence; derivatives distributed over the legs.
 */
export function lorentzStructures(angles: number[], squares: number[], k: number): LorentzStructure[] {
  if (angles.length !== squares.length) {
    throw new EngineConsistencyError('lorentzStructures', `angles (${angles.length}) and squares (${squares.length}) differ in length`)
  }
  const out: LorentzStructure[] = []
  for (const derivs of compositions(k, angles.length)) {
    const a = angles.map((x, i) => x + derivs[i]!)
    const s = squares.map((x, i) => x + derivs[i]!)
    const ga = bracketGraphs(a)
    if (ga.length === 0) continue
    const gs = bracketGraphs(s)
    for (const angle of ga) for (const square of gs) out.push({ derivs, angle, square })
  }
  return out
}
