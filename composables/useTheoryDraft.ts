import { computed, reactive, ref, watch, onBeforeUnmount, type Ref } from 'vue'
import { TheorySchema, formatTheoryIssues, type Theory } from '#shared/schemas/theory'
import { describeIssue, inputMessage } from '#shared/schemas/describeZodError'
import type { TheoryCheckReply } from '#shared/schemas/theoryCheck'
import {
  type TheoryDraft,
  type DraftGroup,
  type DraftField,
  type DraftRule,
  emptyDraft,
  theoryToDraft,
  draftToTheory,
  issueKey,
  newGroup,
  newField,
  newRule,
  newCoupling,
  newUid,
} from './theoryDraftModel'
import { newHeavy } from './theoryDraft/heavyBlock'
import { newGoldstone } from './theoryDraft/goldstoneBlock'
import { apiMessage } from './useValidatedForm'

function move<T>(rows: T[], i: number, delta: number) {
  const j = i + delta
  if (j < 0 || j >= rows.length) return
  const [row] = rows.splice(i, 1)
  rows.splice(j, 0, row!)
}

/**
 * Editor state of one theory: the draft, its validation by the same TheorySchema as the server
 * (messages keyed by input, see issueKey), the row operations and the dirty flag.
 */
export function useTheoryDraft(initial?: unknown) {
  const draft = ref<TheoryDraft>(initial === undefined ? emptyDraft() : theoryToDraft(initial)) as Ref<TheoryDraft>
  const baseline = ref('')

  const checked = computed(() => {
    const { theory, issues: local } = draftToTheory(draft.value)
    const parsed = TheorySchema.safeParse(theory)
    const schemaIssues = parsed.success ? [] : parsed.error.issues
    const errors: Record<string, string> = {}
    for (const iss of [...local, ...schemaIssues]) errors[issueKey(iss.path)] ??= inputMessage(iss.message)
    const lines = local.map((i) => describeIssue(i, theory, 'the theory'))
    if (schemaIssues.length) lines.push(...formatTheoryIssues(theory, schemaIssues).split('\n'))
    const valid = parsed.success && local.length === 0
    return { theory, valid, errors, lines, definition: valid ? (parsed.data as Theory) : null }
  })

  const json = computed(() => JSON.stringify(checked.value.theory))
  const dirty = computed(() => json.value !== baseline.value)

  /** Replace the draft by a theory file (a parsed object); marks it clean when `clean`. */
  function load(theory: unknown, clean = true) {
    draft.value = theoryToDraft(theory)
    if (clean) markClean()
  }
  function markClean() {
    baseline.value = JSON.stringify(draftToTheory(draft.value).theory)
  }
  if (initial !== undefined) markClean()

  // A message shows once the user has edited its entry (a row, or a top-level input), after a
  // save attempt, or for a loaded file: an untouched form shows no errors.
  const edited = reactive(new Set<string>())
  const revealed = ref(false)
  const entryOf = (path: (string | number)[]): string => {
    const [key, i] = path
    if ((key === 'groups' || key === 'fields' || key === 'countingRules') && typeof i === 'number') return draft.value[key][i]?.uid ?? ''
    return String(key)
  }
  const error = (...path: (string | number)[]) => (revealed.value || edited.has(entryOf(path)) ? checked.value.errors[path.map(String).join('.')] : undefined)
  /** The user typed into the entry `entry` (a row's uid, or "name", "maxOrder", "heavy"). */
  const markEdited = (entry: string) => {
    edited.add(entry)
  }
  /** Show every message (a save attempt, or a file the user loaded). */
  const reveal = () => {
    revealed.value = true
  }

  const ops = {
    addGroup: () => draft.value.groups.push(newGroup()),
    removeGroup: (i: number) => draft.value.groups.splice(i, 1),
    moveGroup: (i: number, delta: number) => move<DraftGroup>(draft.value.groups, i, delta),
    addField: () => draft.value.fields.push(newField()),
    removeField: (i: number) => draft.value.fields.splice(i, 1),
    moveField: (i: number, delta: number) => move<DraftField>(draft.value.fields, i, delta),
    addRule: () => draft.value.countingRules.push(newRule()),
    addCoupling: () => draft.value.couplings.push(newCoupling()),
    removeCoupling: (i: number) => draft.value.couplings.splice(i, 1),
    removeRule: (i: number) => draft.value.countingRules.splice(i, 1),
    moveRule: (i: number, delta: number) => move<DraftRule>(draft.value.countingRules, i, delta),
    addWeight: (r: number) => draft.value.countingRules[r]!.weights.push({ uid: newUid('w'), block: '', value: '' }),
    removeWeight: (r: number, w: number) => draft.value.countingRules[r]!.weights.splice(w, 1),
    addHeavy: () => {
      draft.value.heavy = newHeavy(draft.value.groups)
    },
    removeHeavy: () => {
      delete draft.value.heavy
    },
    addGoldstone: () => {
      draft.value.goldstone = newGoldstone()
    },
    removeGoldstone: () => {
      delete draft.value.goldstone
    },
  }

  return { draft, checked, dirty, load, markClean, error, markEdited, reveal, ...ops }
}

/**
 * The gauge-anomaly check of the server (POST /api/theory-check), called `delayMs` after the
 * last change of a valid definition; older answers are dropped when a newer request is out.
 */
export function useAnomalyCheck(definition: Ref<Theory | null>, delayMs = 500) {
  const reply = ref<TheoryCheckReply | null>(null)
  const pending = ref(false)
  const failure = ref('')
  let timer: ReturnType<typeof setTimeout> | undefined
  let sequence = 0

  async function run(theory: Theory) {
    const mine = ++sequence
    try {
      const r = await $fetch<TheoryCheckReply>('/api/theory-check', { method: 'POST', body: { theory } })
      if (mine === sequence) {
        reply.value = r
        failure.value = ''
      }
    } catch (e) {
      if (mine === sequence) {
        reply.value = null
        failure.value = apiMessage(e)
      }
    } finally {
      if (mine === sequence) pending.value = false
    }
  }

  watch(
    () => JSON.stringify(definition.value),
    () => {
      clearTimeout(timer)
      const theory = definition.value
      if (!theory) {
        sequence++
        pending.value = false
        reply.value = null
        return
      }
      pending.value = true
      timer = setTimeout(() => run(theory), delayMs)
    },
    { immediate: true },
  )
  onBeforeUnmount(() => clearTimeout(timer))

  return { reply, pending, failure }
}
