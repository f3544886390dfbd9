// The theory open in the editor: what the server last saved (definition + version), the
// presets to start from, and saving with the version guard (a 409 is kept as `conflict`,
// never retried or overwritten).
import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { Theory } from '#shared/schemas/theory'
import type { GroupRole } from '#shared/types/roles'

export interface SavedTheory {
  id: number
  groupId: number
  name: string
  definition: Theory
  version: number
  updatedAt?: string
}
export interface PresetEntry {
  id: string
  title: string
  description: string
  theory: Theory
}

export const useTheoriesStore = defineStore('theories', () => {
  const current = ref<SavedTheory | null>(null)
  const role = ref<GroupRole | null>(null)
  const presets = ref<PresetEntry[]>([])
  const { pending: saving, submit: once } = useSubmitOnce()
  const saveError = ref('')
  const conflict = ref('')
  const savedAt = ref<number | null>(null)

  function reset() {
    current.value = null
    role.value = null
    saveError.value = ''
    conflict.value = ''
    savedAt.value = null
  }

  async function load(id: number | string) {
    const r = await useRequestFetch()<{ theory: SavedTheory; role: GroupRole }>(`/api/theories/${id}`)
    current.value = r.theory
    role.value = r.role
    conflict.value = ''
    saveError.value = ''
    return r.theory
  }

  async function loadPresets() {
    if (presets.value.length) return presets.value
    presets.value = (await useRequestFetch()<{ presets: PresetEntry[] }>('/api/presets')).presets
    return presets.value
  }

  /** Create or save, once at a time, with a request key (a double click saves one version). */
  async function attempt(action: (headers: Record<string, string>) => Promise<SavedTheory>) {
    if (saving.value) return null
    saveError.value = ''
    conflict.value = ''
    try {
      const saved = await once(action)
      if (!saved) return null
      current.value = saved
      savedAt.value = Date.now()
      return current.value
    } catch (error) {
      const status = (error as { statusCode?: number; status?: number }).statusCode ?? (error as { status?: number }).status
      if (status === 409 && current.value) conflict.value = apiMessage(error)
      else saveError.value = apiMessage(error)
      return null
    }
  }

  /** Declare a new theory in a group (POST /api/groups/:slug/theories). */
  function create(slug: string, definition: Theory) {
    return attempt(async (headers) => (await $fetch<{ theory: SavedTheory }>(`/api/groups/${slug}/theories`, { method: 'POST', headers, body: { definition } })).theory)
  }

  /** Save the open theory as its next version (PATCH with the version it was loaded at). */
  function save(definition: Theory) {
    const open = current.value
    if (!open) throw new Error('no theory is open')
    return attempt(async (headers) => (await $fetch<{ theory: SavedTheory }>(`/api/theories/${open.id}`, { method: 'PATCH', headers, body: { definition, version: open.version } })).theory)
  }

  return { current, role, presets, saving, saveError, conflict, savedAt, reset, load, loadPresets, create, save }
})
