// One operator of the heavy-particle frame, as every sector's enumerator returns it (apart from
// enumerate.ts, which imports those enumerators).
import type { CoefficientRelation } from './conventional'
import type { Combo } from './structure'
import type { FourCombo } from './fourStructure'
import type { LightCombo } from './lightStructure'

export interface HeavyOperator {
  id: string
  order: number
  sector: 'leading' | 'bilinear' | 'fourFermion' | 'heavyLight' | 'heavyHeavy'
  latex: string
  /** Building-block counts of each term (for counting rules; the order is the lowest term). */
  terms: Array<Record<string, number>>
  combo?: Combo
  /** Four-fermion operators: the combination of contact structures (see fourStructure.ts). */
  fourCombo?: FourCombo
  /** Heavy–light operators: the combination of contact structures (see lightStructure.ts). */
  lightCombo?: LightCombo
  antiHermitian?: boolean
  coefficient?: string
  relations: CoefficientRelation[]
  gaugeEomNote?: string
  source?: string
  /** Published forms: the printed operator on the enumerated basis as displayed. */
  rewrite?: Array<{ id: string; coefficient: string }>
  /** χ copies: the ψ-operator whose coefficient fixes this one, and the factor. */
  fixedBy?: { id: string; factor: number }
  /** Parity and time-reversal signs (absent = even). */
  parityOdd?: boolean
  timeOdd?: boolean
}
