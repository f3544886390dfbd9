// The undo offer after a deletion: one at a time, shown by LayoutUndoToast for UNDO_SECONDS
// (it survives navigation, e.g. from a deleted theory to its group). The deleted row stays in
// the database, marked, so the offer's action (the row's restore route) can always bring it back.
const UNDO_SECONDS = 20

export const useUndoStore = defineStore('undo', () => {
  const text = ref('')
  const error = ref('')
  const pending = ref(false)
  let action: (() => Promise<unknown>) | null = null
  let timer: ReturnType<typeof setTimeout> | undefined

  function dismiss() {
    text.value = ''
    action = null
    clearTimeout(timer)
  }
  /** Offer to undo what `what` says was deleted; `restore` brings it back. */
  function offer(what: string, restore: () => Promise<unknown>) {
    dismiss()
    error.value = ''
    text.value = what
    action = restore
    timer = setTimeout(dismiss, UNDO_SECONDS * 1000)
  }
  async function undo() {
    if (!action || pending.value) return
    pending.value = true
    try {
      await action()
      dismiss()
    } catch (e) {
      error.value = apiMessage(e)
    } finally {
      pending.value = false
    }
  }
  return { text, error, pending, offer, undo, dismiss }
})
