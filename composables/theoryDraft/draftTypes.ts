// Types of the editor's draft that its blocks (labels, heavy, Goldstone) share with the model,
// kept apart so the blocks need not import the model that imports them.
// (Outside composables/' top level, so Nuxt does not auto-import it.)

import type { GroupKind } from '../../shared/schemas/groupKinds'
export type { GroupKind }

export interface DraftGroup {
  uid: string
  name: string
  type: GroupKind
  n: string
  gauge: boolean
  description?: string
}

/** A problem found while reading the typed text, at the theory-file path of its input. */
export interface DraftIssue {
  path: (string | number)[]
  message: string
}
