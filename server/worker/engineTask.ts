import { Worker } from 'node:worker_threads'
import { resolve } from 'node:path'
import { pathToFileURL } from 'node:url'
import { EngineCancelledError, EngineError } from '../engine/errors'
import type { Priorities } from '../engine/basis/classBasis'

/**
 * The thread runs the engine from its TypeScript source through tsx: beside the source when we
 * run from it (worker process, tests), else from the repository the built server runs in.
 */
function threadEntry(): URL {
  const here = import.meta.url
  if (here.endsWith('.ts')) return new URL('./engineThreadBoot.mjs', here)
  return pathToFileURL(resolve(process.env.SCALEWRIGHT_ROOT || process.cwd(), 'server/worker/engineThreadBoot.mjs'))
}

export type EngineTask =
  | { kind: 'count' | 'basis', theory: unknown, maxDim?: number, maxOrder?: number, nf?: number, priorities?: Priorities }
  | { kind: 'fingerprint', theory: unknown, classKey: string, texts: string[], priorities?: Priorities }
export interface TaskHandle<T> { result: Promise<T>, cancel: () => void }

/**
 * Start an engine task in a worker thread. Progress arrives through `onProgress`; `cancel()`
 * raises the shared flag (the engine stops at its next check) and, as a last resort, ends the
 * thread after a grace period.
 */
export function startEngineTask<T>(task: EngineTask, onProgress: (fraction: number, label: string) => void): TaskHandle<T> {
  const cancelFlag = new Int32Array(new SharedArrayBuffer(4))
  const worker = new Worker(threadEntry(), { workerData: { task, cancelFlag } })
  let cancelled = false
  const result = new Promise<T>((resolve, reject) => {
    worker.on('message', (msg) => {
      if (msg.type === 'progress') onProgress(msg.fraction, msg.label)
      else if (msg.type === 'done') resolve(msg.result as T)
      else if (msg.type === 'error') {
        reject(msg.name === 'EngineCancelledError' ? new EngineCancelledError() : Object.assign(new EngineError(msg.message), { name: msg.name }))
      }
    })
    worker.on('error', reject)
    worker.on('exit', (code) => {
      if (cancelled) reject(new EngineCancelledError())
      else if (code !== 0) reject(new EngineError(`engine thread exited with code ${code}`))
    })
  }).finally(() => { void worker.terminate() })
  return {
    result,
    cancel() {
      cancelled = true
      Atomics.store(cancelFlag, 0, 1)
      setTimeout(() => { void worker.terminate() }, 3000).unref()
    },
  }
}
