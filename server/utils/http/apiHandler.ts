import { defineEventHandler, createError, isError, setResponseStatus, type H3Event, type H3Error, type EventHandlerRequest } from 'h3'
import { ZodError } from 'zod'
import { EngineInputError } from '../../engine/errors'
import { describeZodError } from '../../../shared/schemas/describeZodError'
import { databaseUnavailableError } from './databaseUnavailable'
import { reportInternalError } from '../internalError'
import { computeBusyError } from '../compute/computeErrors'

/**
 * The one error mapper of the API: every route is written with it, so every answer is JSON with
 * a readable `message`. Errors the classifiers recognise keep their status (schema 400, engine
 * input 422, H3 errors as thrown); anything else, engine consistency failures included, is a
 * 500 with a reference the user can quote, and the error is logged under that reference.
 */
export function defineApiHandler<T>(handler: (event: H3Event<EventHandlerRequest>) => Promise<T> | T) {
  return defineEventHandler(async (event) => {
    try {
      return await handler(event)
    } catch (error) {
      throw toHttpError(error, event)
    }
  })
}

/** Turns the errors it recognises into an HTTP error, else answers undefined. */
export type ErrorClassifier = (error: unknown, event?: H3Event) => H3Error | undefined

function answer(statusCode: number, statusMessage: string, message: string): H3Error {
  return createError({ statusCode, statusMessage, message, data: { message } })
}

/** The classifiers, tried in order; the first answer wins. Add a case here rather than in the routes. */
export const ERROR_CLASSIFIERS: ErrorClassifier[] = [
  // PostgreSQL away (stopped, restarting): 503 with Retry-After, not an internal error.
  (e, event) => (event ? databaseUnavailableError(event, e) : undefined),
  // Too much work waiting (compute lanes, runs): 429 with Retry-After.
  (e, event) => (event ? computeBusyError(event, e) : undefined),
  // Thrown on purpose by routes (fail(), requireUser, 404s); a bare 5xx from a library is not ours.
  (e) => (isError(e) && (e.statusCode < 500 || typeof (e.data as { message?: unknown } | undefined)?.message === 'string') ? e : undefined),
  (e) => (e instanceof ZodError ? answer(400, 'Bad Request', describeZodError(e)) : undefined),
  (e) => (e instanceof EngineInputError ? answer(422, 'Unprocessable Entity', e.message) : undefined),
]

export function toHttpError(error: unknown, event?: H3Event): H3Error {
  for (const classify of ERROR_CLASSIFIERS) {
    const known = classify(error, event)
    if (known) return known
  }
  const { ref, text } = reportInternalError(error, event ? `${event.method} ${event.path}` : 'a request')
  return createError({ statusCode: 500, statusMessage: 'Internal Server Error', message: text, data: { message: text, ref } })
}

/** Throw an HTTP error with a readable JSON message. */
export function fail(statusCode: number, message: string): never {
  throw createError({ statusCode, message, data: { message } })
}

export function created(event: H3Event) {
  setResponseStatus(event, 201)
}
