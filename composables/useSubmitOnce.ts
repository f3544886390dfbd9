/** A fresh request key: 128 random bits as hex (crypto.getRandomValues also works on plain http). */
export function newRequestKey(): string {
  const bytes = new Uint8Array(16)
  crypto.getRandomValues(bytes)
  return Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('')
}

/**
 * One form's guard against double submission: `pending` disables its button while a request
 * runs, a second submit meanwhile is ignored, and every request carries an Idempotency-Key that
 * stays the same until a request with it succeeds — so a request the network repeats, or one
 * sent again after an unclear failure, is done once by the server (server/utils/http/requestKeys.ts).
 */
export function useSubmitOnce() {
  const pending = ref(false)
  let key = newRequestKey()
  async function submit<T>(action: (headers: { 'idempotency-key': string }) => Promise<T>): Promise<T | undefined> {
    if (pending.value) return undefined
    pending.value = true
    try {
      const out = await action({ 'idempotency-key': key })
      key = newRequestKey()
      return out
    } finally {
      pending.value = false
    }
  }
  return { pending, submit }
}
