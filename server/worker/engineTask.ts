import { Worker } from 'node:worker_threads'
import { resolve } from 'node:path'
import { pathToFileURL } from 'node:url'
import { EngineCancelledError } from '../engine/errors'
import { fromThreadError } from './threadError'
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
  | { kind: 'count' | 'basis'; theory: unknown; maxDim?: number; maxOrder?: number; nf?: number; priorities?: Priorities }
  | { kind: 'fingerprint'; theory: unknown; classKey: string; texts: string[]; priorities?: Priorities }
export interface TaskHandle<T> {
  result: Promise<T>
  cancel: () => void
}

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
      else if (msg.type === 'error') reject(fromThreadError(msg))
    })
    // An error the thread could not post (it failed to load, ran out of memory, …) is unexpected.
    worker.on('error', reject)
    worker.on('exit', (code) => {
      if (cancelled) reject(new EngineCancelledError(task.kind))
      else if (code !== 0) reject(new Error(`the engine thread stopped with exit code ${code}`))
    })
  }).finally(() => {
    void worker.terminate()
  })
  return {
    result,
    cancel() {
      cancelled = true
      Atomics.store(cancelFlag, 0, 1)
      setTimeout(() => {
        void worker.terminate()
      }, 3000).unref()
    },
  }
}
