// Background runs of one theory: start, follow progress (polling), cancel.
export interface Run {
  id: number, theoryId: number, kind: 'count' | 'basis', status: 'queued' | 'running' | 'done' | 'failed' | 'cancelled'
  progress: number, currentLabel: string, maxDim: number | null, maxOrder: number | null, nf: number | null, summary: any, error: string | null
  createdAt: string, finishedAt: string | null
}

export const useRunsStore = defineStore('runs', () => {
  const runs = ref<Run[]>([])
  const theoryId = ref<number | null>(null)
  const active = computed(() => runs.value.filter((r) => r.status === 'queued' || r.status === 'running'))

  async function load(id: number) {
    theoryId.value = id
    runs.value = (await useRequestFetch()(`/api/theories/${id}/runs`)).runs as Run[]
  }
  async function start(body: { kind: 'count' | 'basis', maxDim?: number, maxOrder?: number, nf?: number, priorities?: Record<string, unknown> }, headers?: Record<string, string>) {
    const { run } = await $fetch(`/api/theories/${theoryId.value}/runs`, { method: 'POST', body, headers })
    if (!runs.value.some((r) => r.id === (run as Run).id)) runs.value = [run as Run, ...runs.value]
    return run as Run
  }
  async function refreshActive() {
    for (const r of active.value) {
      const { run } = await $fetch(`/api/runs/${r.id}`)
      const i = runs.value.findIndex((x) => x.id === r.id)
      if (i >= 0) runs.value[i] = run as Run
    }
  }
  async function cancel(id: number) {
    const { run } = await $fetch(`/api/runs/${id}/cancel`, { method: 'POST' })
    const i = runs.value.findIndex((x) => x.id === id)
    if (i >= 0) runs.value[i] = run as Run
  }
  return { runs, theoryId, active, load, start, refreshActive, cancel }
})
