import { defineEventHandler, createError, isError, setResponseStatus, type H3Event, type EventHandlerRequest } from 'h3'
import { ZodError } from 'zod'
import { EngineError, EngineInputError } from '../../engine/errors'
import { describeZodError } from '../../../shared/schemas/describeZodError'
import { databaseUnavailableError } from './databaseUnavailable'

/**
 * The one error mapper of the API: schema errors → 400, engine input errors → 422 with the
 * engine's message, H3 errors as thrown (401/403/404/409/413…), anything else → 500 without
 * internals. Every route is written with it, so every answer is JSON with a `message`.
 */
export function defineApiHandler<T>(handler: (event: H3Event<EventHandlerRequest>) => Promise<T> | T) {
  return defineEventHandler(async (event) => {
    try {
      return await handler(event)
    } catch (error) {
      throw databaseUnavailableError(event, error) ?? toHttpError(error)
    }
  })
}

export function toHttpError(error: unknown) {
  if (isError(error)) return error
  if (error instanceof ZodError) {
    return createError({ statusCode: 400, statusMessage: 'Bad Request', message: describeZodError(error), data: { message: describeZodError(error) } })
  }
  if (error instanceof EngineInputError || error instanceof EngineError) {
    return createError({ statusCode: 422, statusMessage: 'Unprocessable Entity', message: error.message, data: { message: error.message } })
  }
  console.error('[api] unexpected error', error)
  return createError({ statusCode: 500, statusMessage: 'Internal Server Error', message: 'Internal error; it has been logged.' })
}

/** Throw an HTTP error with a readable JSON message. */
export function fail(statusCode: number, message: string): never {
  throw createError({ statusCode, message, data: { message } })
}

export function created(event: H3Event) {
  setResponseStatus(event, 201)
}
