import type { ZodError } from 'zod'

/** One readable line per problem, naming the field at fault: `email: Enter a valid e-mail address`. */
export function describeZodError(error: ZodError): string {
  return error.issues
    .map((issue) => {
      const path = issue.path.map((p) => (typeof p === 'number' ? `[${p}]` : String(p))).join('.').replace(/\.\[/g, '[')
      return path ? `${path}: ${issue.message}` : issue.message
    })
    .join('; ')
}
