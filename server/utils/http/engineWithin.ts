import { EngineCancelledError } from '../../engine/errors'
import type { TaskHandle } from '../../worker/engineTask'
import { fail } from './apiHandler'

/**
 * The result of an engine task computed for one request, cancelled after `limitMs`; a task
 * stopped by the limit answers 422 with `tooLong`, which tells the user what to do instead.
 */
export async function engineResultWithin<T>(handle: TaskHandle<T>, limitMs: number, tooLong: string): Promise<T> {
  const timer = setTimeout(() => handle.cancel(), limitMs)
  try {
    return await handle.result
  } catch (error) {
    if (error instanceof EngineCancelledError) fail(422, tooLong)
    throw error
  } finally {
    clearTimeout(timer)
  }
}
