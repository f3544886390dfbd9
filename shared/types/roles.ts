// Roles, shared by pages and routes (auto-imported in both).
export const GROUP_ROLES = ['viewer', 'commenter', 'editor', 'owner'] as const
export type GroupRole = (typeof GROUP_ROLES)[number]
export type SiteRole = 'admin' | 'member'

/** True when `role` is at least `needed` (viewer < commenter < editor < owner). */
export function roleAtLeast(role: GroupRole | null | undefined, needed: GroupRole): boolean {
  if (!role) return false
  return GROUP_ROLES.indexOf(role) >= GROUP_ROLES.indexOf(needed)
}
