import type { ZodType } from 'zod'
import { inputMessage } from '#shared/schemas/describeZodError'

/**
 * Form state validated by the same zod schema as the server route. Field errors come from
 * the schema on the client, and from the server's JSON `message` when the request fails. The
 * submit button is disabled while a request runs (`busy`); each carries the form's request key.
 */
export function useValidatedForm<T extends Record<string, unknown>>(schema: ZodType, initial: T) {
  const values = reactive({ ...initial }) as T
  const fieldErrors = ref<Record<string, string>>({})
  const formError = ref('')
  const once = useSubmitOnce()
  const busy = once.pending

  function validate(): boolean {
    const result = schema.safeParse(values)
    fieldErrors.value = {}
    if (result.success) return true
    for (const issue of result.error.issues) {
      const key = String(issue.path[0] ?? '')
      fieldErrors.value[key] ??= inputMessage(issue.message)
    }
    return false
  }

  /** Validate, then run `action` once at a time with the form's request key (useSubmitOnce). */
  async function submit(action: (data: T, headers: { 'idempotency-key': string }) => Promise<unknown>) {
    if (busy.value) return false
    formError.value = ''
    if (!validate()) return false
    try {
      return (await once.submit((headers) => action(values, headers).then(() => true))) ?? false
    } catch (error) {
      formError.value = apiMessage(error)
      return false
    }
  }
  return { values, fieldErrors, formError, busy, submit }
}

/**
 * The readable message of a failed $fetch: our API always answers JSON with `message`. Without
 * one (no connection, a proxy's error page) the status says what happened; $fetch's own text
 * ("[POST] /api/…: 502 …") never reaches the screen.
 */
export function apiMessage(error: unknown): string {
  const e = error as { data?: { message?: unknown; data?: { message?: unknown } }; statusCode?: number; status?: number } | null
  const text = e?.data?.data?.message ?? e?.data?.message
  if (typeof text === 'string' && text.trim()) return text
  const status = e?.statusCode ?? e?.status
  if (!status) return 'The server could not be reached; check the connection and try again.'
  if (status >= 500) return 'The server could not finish this request; try again in a moment.'
  return `The server refused this request (HTTP ${status}); reload the page and try again.`
}
