import type { ZodType } from 'zod'

/**
 * Form state validated by the same zod schema as the server route. Field errors come from
 * the schema on the client, and from the server's JSON `message` when the request fails.
 */
export function useValidatedForm<T extends Record<string, unknown>>(schema: ZodType, initial: T) {
  const values = reactive({ ...initial }) as T
  const fieldErrors = ref<Record<string, string>>({})
  const formError = ref('')
  const busy = ref(false)

  function validate(): boolean {
    const result = schema.safeParse(values)
    fieldErrors.value = {}
    if (result.success) return true
    for (const issue of result.error.issues) {
      const key = String(issue.path[0] ?? '')
      fieldErrors.value[key] ??= issue.message
    }
    return false
  }

  async function submit(action: (data: T) => Promise<unknown>) {
    formError.value = ''
    if (!validate()) return false
    busy.value = true
    try {
      await action(values)
      return true
    } catch (error) {
      formError.value = apiMessage(error)
      return false
    } finally {
      busy.value = false
    }
  }
  return { values, fieldErrors, formError, busy, submit }
}

/** The readable message of a failed $fetch (our API always answers JSON with `message`). */
export function apiMessage(error: unknown): string {
  const e = error as { data?: { message?: string, data?: { message?: string } }, message?: string }
  return e?.data?.data?.message || e?.data?.message || e?.message || 'Something went wrong'
}
