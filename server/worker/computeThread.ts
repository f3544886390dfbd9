// Compute-pool thread: answers one task at a time ({ id, kind, input } → { id, ok, result | error }).
// A task that overruns its budget is not interrupted here: the pool ends the whole thread.
import { parentPort } from 'node:worker_threads'
import { COMPUTE_TASKS, type ComputeKind } from './computeTasks'
import { toThreadError } from './threadError'

parentPort!.on('message', (msg: { id: number; kind: ComputeKind; input: unknown }) => {
  try {
    const task = COMPUTE_TASKS[msg.kind] as (input: unknown) => unknown
    parentPort!.postMessage({ id: msg.id, ok: true, result: task(msg.input) })
  } catch (error) {
    parentPort!.postMessage({ id: msg.id, ok: false, error: toThreadError(error) })
  }
})
parentPort!.postMessage({ ready: true })
