// The signed-in user's groups and the group on screen.
export interface GroupSummary {
  id: number
  slug: string
  name: string
  description: string
  role: GroupRole
}

export const useGroupsStore = defineStore('groups', () => {
  const mine = ref<GroupSummary[]>([])
  async function loadMine() {
    mine.value = (await useRequestFetch()('/api/groups')).groups as GroupSummary[]
  }
  async function create(body: { slug: string; name: string; description?: string }, headers?: Record<string, string>) {
    const { group } = await $fetch('/api/groups', { method: 'POST', body, headers })
    mine.value = [...mine.value, group as GroupSummary].sort((a, b) => a.name.localeCompare(b.name))
    return group as GroupSummary
  }
  return { mine, loadMine, create }
})
