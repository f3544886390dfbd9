// Background runs of one theory: start, follow progress (polling), cancel.
/** A count run's table by dimension (relativistic frame). */
export interface CountSummary {
  byDimension: { dimension: number; operators: number; tallyOk?: boolean; classes: Record<string, number> }[]
}
/** A Goldstone-frame count run's table by chiral order. */
export interface GoldstoneCountSummary {
  coset: string
  byOrder: { order: number; operators: number; byParity: { even: number; odd: number }; contact: number; classes: { key: string; operators: number }[] }[]
}
/** One order's line in a heavy-frame or Goldstone-frame basis summary. */
export interface SummaryOrderLine {
  order: number
  operators: number
  tallyOk?: boolean
  hilbert?: number
  realParameters?: number
  matchesPublished?: boolean
}
/** What a finished run reports (runs.summary); which keys are present depends on the frame and kind. */
export interface RunSummary {
  basisId?: number
  coset?: string
  goldstone?: unknown
  heavy?: unknown
  byOrder?: SummaryOrderLine[]
  byDimension?: CountSummary['byDimension']
}
export interface Run {
  id: number
  theoryId: number
  kind: 'count' | 'basis'
  status: 'queued' | 'running' | 'done' | 'failed' | 'cancelled'
  progress: number
  currentLabel: string
  maxDim: number | null
  maxOrder: number | null
  nf: number | null
  summary: RunSummary | null
  error: string | null
  createdAt: string
  finishedAt: string | null
}

export const useRunsStore = defineStore('runs', () => {
  const runs = ref<Run[]>([])
  const theoryId = ref<number | null>(null)
  const active = computed(() => runs.value.filter((r) => r.status === 'queued' || r.status === 'running'))

  async function load(id: number) {
    theoryId.value = id
    runs.value = (await useRequestFetch()(`/api/theories/${id}/runs`)).runs as Run[]
  }
  async function start(body: { kind: 'count' | 'basis'; maxDim?: number; maxOrder?: number; nf?: number; priorities?: Record<string, unknown> }, headers?: Record<string, string>) {
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
