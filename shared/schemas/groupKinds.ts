/**
 * The kinds of symmetry group a theory file can declare, with their readable names and the
 * shape of their representations. Pure data: used by the schema, the editor and the engine.
 * - continuous, non-abelian: SU(n) 2..8, SO(n) 5..18 (B/D series), Sp(n) n even 4..16 (C series),
 *   G2, F4, E6, E7, E8 — representations are Dynkin labels (Bourbaki's numbering, as in LiE);
 * - U1 (charges, rational), Z (Z_n, charges mod n, 2 <= n <= 64);
 * - finite non-abelian flavour groups S3, A4, S4, Q8, Tprime (T′), Delta27 (Δ(27)) —
 *   representations are irrep names (server/engine/group/finite/tables.ts).
 */
import { FINITE_GROUPS, FINITE_KINDS, type FiniteKind } from '../physics/finite/tables'

export const LIE_KINDS = ['SU', 'SO', 'Sp', 'G2', 'F4', 'E6', 'E7', 'E8'] as const
export type LieKind = (typeof LIE_KINDS)[number]
export const GROUP_KINDS = ['SU', 'U1', 'Z', 'SO', 'Sp', 'G2', 'F4', 'E6', 'E7', 'E8', ...FINITE_KINDS] as const
export type GroupKind = 'U1' | 'Z' | LieKind | FiniteKind

/** n ranges of the kinds that take n. */
export const N_RANGE: Partial<Record<GroupKind, readonly [number, number]>> = { SU: [2, 8], SO: [5, 18], Sp: [4, 16], Z: [2, 64] }

/** Rank of the exceptional algebras (for the number of Dynkin labels). */
const EXCEPTIONAL_RANK: Partial<Record<GroupKind, number>> = { G2: 2, F4: 4, E6: 6, E7: 7, E8: 8 }

export function isLieKind(kind: string): kind is LieKind {
  return (LIE_KINDS as readonly string[]).includes(kind)
}

export function isFiniteKind(kind: string): kind is FiniteKind {
  return (FINITE_KINDS as readonly string[]).includes(kind)
}

export function takesN(kind: string): boolean {
  return kind in N_RANGE
}

/** Whether n is valid for the kind (Sp(n) needs n even). */
export function validN(kind: string, n: number | undefined): boolean {
  const r = N_RANGE[kind as GroupKind]
  if (!r) return n === undefined
  return n !== undefined && Number.isInteger(n) && n >= r[0] && n <= r[1] && (kind !== 'Sp' || n % 2 === 0)
}

/**
 * Number of Dynkin labels of a Lie group (its rank), or undefined for invalid n.
 * @example lieRank('SO', 10) // 5
 */
export function lieRank(kind: LieKind, n: number | undefined): number | undefined {
  if (kind in EXCEPTIONAL_RANK) return EXCEPTIONAL_RANK[kind]
  if (!validN(kind, n)) return undefined
  if (kind === 'SU') return n! - 1
  return Math.floor(n! / 2)
}

/**
 * Readable name of a group kind, e.g. "SU(3)", "U(1)", "Z3", "SO(10)", "Sp(4)", "E6", "T′", "Δ(27)".
 * @example groupKindLabel('Delta27') // "Δ(27)"
 */
export function groupKindLabel(kind: string, n?: number): string {
  if (kind === 'U1') return 'U(1)'
  if (kind === 'Z') return `Z${n ?? 'n'}`
  if (kind === 'SU' || kind === 'SO' || kind === 'Sp') return `${kind}(${n ?? 'n'})`
  if (isFiniteKind(kind)) return FINITE_GROUPS[kind].label
  return kind
}

/** Irrep names of a finite group, in the order of its character table. */
export function finiteIrrepNames(kind: FiniteKind): string[] {
  return FINITE_GROUPS[kind].irreps.map((r) => r.name)
}

/** What a field gives per group in the editor and the file: Dynkin labels, an irrep name, or a charge. */
export function groupInputKind(kind: string): 'labels' | 'irrep' | 'charge' {
  return isLieKind(kind) ? 'labels' : isFiniteKind(kind) ? 'irrep' : 'charge'
}

/** The kinds offered by the editor, with their readable names, in menu order. */
export const GROUP_KIND_MENU: readonly { kind: GroupKind; label: string }[] = [
  { kind: 'SU', label: 'SU(n)' },
  { kind: 'SO', label: 'SO(n)' },
  { kind: 'Sp', label: 'Sp(n)' },
  { kind: 'G2', label: 'G2' },
  { kind: 'F4', label: 'F4' },
  { kind: 'E6', label: 'E6' },
  { kind: 'E7', label: 'E7' },
  { kind: 'E8', label: 'E8' },
  { kind: 'U1', label: 'U(1)' },
  { kind: 'Z', label: 'Z_n' },
  ...FINITE_KINDS.map((kind) => ({ kind, label: FINITE_GROUPS[kind].label })),
]
