import { fieldTexTable } from '#shared/schemas/fieldDisplay'
// The basis on the board: operators in kept / set-aside columns per order, coverage per
// class, tags and notes. Moves are optimistic: the list changes at once, the server confirms
// (new version, coverage, rewrite) or the board reloads and says why.
export interface BoardOperator {
  id: number
  order: number
  classKey: string
  column: 'kept' | 'set_aside'
  position: number
  latex: string
  latexDirac: string | null
  hermitian: boolean
  realParameters: number
  text: string
  version: number
  flavorComponents: number
  details?: {
    antiHermitian: boolean
    parity: 'even' | 'odd' | null
    cp: 'even' | 'odd' | 'both' | null
    relations: { coefficient: string; relation: string; source: string }[]
    publishedRewrite: { id: string; coefficient: string }[] | null
    gaugeEomNote: string | null
    source: string | null
  }
}
/** Heavy-frame classes have an order in 1/m and no mass dimension, no Hilbert series (null). */
export interface BoardClass {
  order: number
  dimension: number | null
  key: string
  rank: number
  hilbert: number | null
  tallyOk: boolean | null
  message?: string | null
  realParameters?: number
  cpEven?: number | null
  cpOdd?: number | null
  pEven?: number | null
  pOdd?: number | null
  parityReason?: string | null
  /** Goldstone frame: one class per chiral order, with the Hilbert-series classes it holds. */
  frame?: 'goldstone'
  hilbertClasses?: { key: string; hilbert: number; rank: number; tallyOk: boolean }[]
  contact?: { hilbert: number; rank: number; kept: number }
  evaluatedAtN?: number
}

/** A rewrite onto the kept operators; `exact: false` when the coefficients are beyond what the fingerprints give exactly. */
export interface Rewrite {
  exact?: boolean
  message?: string
  vanishes: boolean
  terms: { operatorId: number; latex: string; coefficient: string }[]
}
/** Tags and notes carry their author: an account, or a name kept as text from an imported file (`authorImported`). */
export interface BoardTag {
  id: number
  operatorId: number
  kind: string
  label: string
  authorId?: number | null
  authorName?: string | null
  authorImported?: boolean
}
export interface BoardNote {
  id: number
  operatorId: number | null
  body: string
  createdAt: string
  updatedAt: string
  authorId: number | null
  authorName: string | null
  authorImported?: boolean
}
type KeyHeaders = Record<string, string>
export interface ClassCoverage {
  rank: number
  required: number
  complete: boolean
}
/** The basis itself, as GET /api/bases/:id sends it (server/utils/db/bases.ts boardData). */
export interface BoardBasis {
  id: number
  theoryId: number
  theoryName: string
  theoryVersion: number
  countingRule: string
  maxOrder: number | null
  classes: BoardClass[]
  note: string
  createdAt: string
}
export interface BoardData {
  basis: BoardBasis
  role: string
  coverage?: Record<string, ClassCoverage>
  tags: BoardTag[]
  notes: BoardNote[]
  operators: BoardOperator[]
}
interface MoveAnswer {
  operator: { version: number }
  coverage: ClassCoverage
  rewrite: Rewrite | null
}

export const useBoardStore = defineStore('board', () => {
  const basis = ref<BoardBasis | null>(null)
  const role = ref<string>('viewer')
  const columns = ref<Record<number, { kept: BoardOperator[]; set_aside: BoardOperator[] }>>({})
  const coverage = ref<Record<string, ClassCoverage>>({})
  const tags = ref<BoardTag[]>([])
  const notes = ref<BoardNote[]>([])
  const rewrites = ref<Record<number, Rewrite | null>>({})
  const message = ref('')
  const notation = ref<'two' | 'four'>('two')
  const filter = reactive({ tag: '', text: '' })
  // Imposing P or CP (one at a time) keeps only the even real parameters of each class.
  const impose = ref<'' | 'p' | 'cp'>('')
  const readonly = computed(() => !['editor', 'owner'].includes(role.value))
  // Each field's TeX (display form, else the upright name) for class labels.
  const fieldTex = computed(() => fieldTexTable(basis.value))
  // Counting-rule view: the orders of every operator under another rule of the theory.
  const rules = ref<{ name: string; kind: string }[]>([])
  const ruleName = ref('')
  const ruleOrders = ref<Record<number, string>>({})
  const ordersBase = ref('')
  async function loadRules(base: string) {
    ordersBase.value = base
    rules.value = (await useRequestFetch()<{ rules: { name: string; kind: string }[] }>(base)).rules
  }
  async function selectRule(name: string) {
    ruleName.value = name
    ruleOrders.value = name ? (await $fetch<{ orders: Record<number, string> }>(ordersBase.value, { query: { rule: name } })).orders : {}
  }
  /** The order under the selected rule when it differs from the stored one, else null. */
  function changedOrder(op: BoardOperator): string | null {
    const o = ruleOrders.value[op.id]
    return o !== undefined && o !== String(op.order) ? o : null
  }

  function setData(data: BoardData) {
    basis.value = data.basis
    role.value = data.role
    coverage.value = data.coverage ?? {}
    tags.value = data.tags
    notes.value = data.notes
    const cols: Record<number, { kept: BoardOperator[]; set_aside: BoardOperator[] }> = {}
    for (const c of data.basis.classes) cols[c.order] ??= { kept: [], set_aside: [] }
    for (const op of data.operators) (cols[op.order] ??= { kept: [], set_aside: [] })[op.column].push(op)
    columns.value = cols
  }
  async function load(id: number) {
    setData(await useRequestFetch()<BoardData>(`/api/bases/${id}`))
  }

  /** Called after vuedraggable already placed `op` at `index` of `column` (optimistic). */
  async function confirmMove(op: BoardOperator, column: 'kept' | 'set_aside', index: number) {
    message.value = ''
    try {
      const res = await $fetch<MoveAnswer>(`/api/operators/${op.id}/move`, { method: 'POST', body: { column, position: index, version: op.version } })
      Object.assign(op, { column, version: res.operator.version })
      coverage.value[op.classKey] = res.coverage
      // Rewrites of this class referred to the old kept set: drop them (reloaded on demand).
      for (const list of Object.values(columns.value)) {
        for (const o of [...list.kept, ...list.set_aside]) if (o.classKey === op.classKey) delete rewrites.value[o.id]
      }
      if (column === 'set_aside') rewrites.value[op.id] = res.rewrite
    } catch (e) {
      message.value = apiMessage(e)
      await load(basis.value!.id)
    }
  }
  /** Keyboard alternative to dragging: move to the end of the other column. */
  async function toggleColumn(op: BoardOperator) {
    const col = columns.value[op.order]!
    const from = col[op.column]
    const to = op.column === 'kept' ? 'set_aside' : 'kept'
    from.splice(from.indexOf(op), 1)
    col[to].push(op)
    await confirmMove(op, to, col[to].length - 1)
  }
  async function loadRewrite(op: BoardOperator) {
    rewrites.value[op.id] = (await $fetch(`/api/operators/${op.id}/rewrite`)).rewrite as Rewrite | null
  }
  async function addTag(opId: number, kind: string, label: string | undefined, headers: KeyHeaders) {
    const { tag } = await $fetch<{ tag: BoardTag }>(`/api/operators/${opId}/tags`, { method: 'POST', headers, body: label ? { kind, label } : { kind } })
    if (!tags.value.some((t) => t.id === tag.id)) tags.value.push(tag)
  }
  async function addNote(opId: number, body: string, headers: KeyHeaders) {
    const { annotation } = await $fetch<{ annotation: BoardNote }>(`/api/theories/${basis.value!.theoryId}/annotations`, { method: 'POST', headers, body: { operatorId: opId, body } })
    if (!notes.value.some((n) => n.id === annotation.id)) notes.value.push(annotation)
  }
  /** Delete a tag or a note; the undo toast offers its restore route, after which the board reloads. */
  async function remove(kind: 'tag' | 'note', id: number) {
    const res = await $fetch<{ undo: string }>(kind === 'tag' ? `/api/tags/${id}` : `/api/annotations/${id}`, { method: 'DELETE' })
    if (kind === 'tag') tags.value = tags.value.filter((t) => t.id !== id)
    else notes.value = notes.value.filter((n) => n.id !== id)
    const basisId = basis.value!.id
    useUndoStore().offer(kind === 'tag' ? 'Tag removed.' : 'Note deleted.', async () => {
      await $fetch(res.undo, { method: 'POST' })
      if (basis.value?.id === basisId) await load(basisId)
    })
  }
  async function editNote(id: number, body: string) {
    await $fetch(`/api/annotations/${id}`, { method: 'PATCH', body: { body } })
    const n = notes.value.find((x) => x.id === id)
    if (n) n.body = body
  }

  function matches(op: BoardOperator): boolean {
    if (filter.tag && !tags.value.some((t) => t.operatorId === op.id && (t.kind === filter.tag || t.label === filter.tag))) return false
    if (filter.text) {
      const q = filter.text.toLowerCase()
      const hay = [op.classKey, op.text, op.latex, ...notes.value.filter((n) => n.operatorId === op.id).map((n) => n.body)].join(' ').toLowerCase()
      if (!hay.includes(q)) return false
    }
    return true
  }
  const filtering = computed(() => !!(filter.tag || filter.text))
  return {
    fieldTex,
    impose,
    rules,
    ruleName,
    ruleOrders,
    ordersBase,
    loadRules,
    selectRule,
    changedOrder,
    basis,
    role,
    columns,
    coverage,
    tags,
    notes,
    rewrites,
    message,
    notation,
    filter,
    readonly,
    filtering,
    setData,
    load,
    confirmMove,
    toggleColumn,
    loadRewrite,
    addTag,
    addNote,
    remove,
    editNote,
    matches,
  }
})
