// Worker-thread entry: runs one engine task off the main thread. The cancel flag is a shared
// Int32Array, because the engine's loops are synchronous and would never see a message event.
import { parentPort, workerData } from 'node:worker_threads'
import { countOperators } from '../engine/counting/countOperators'
import { buildBasis } from '../engine/basis/buildBasis'
import { typedFingerprints } from '../engine/board/typedOperator'
import { enumerateHeavyTheory } from '../engine/heavy/enumerate'
import { heavyReport } from '../engine/heavy/report'
import { parseTheory } from '../../shared/schemas/theory'
import type { EngineTask } from './engineTask'
import { toThreadError } from './threadError'

const { task, cancelFlag } = workerData as { task: EngineTask, cancelFlag: Int32Array }
const signal = { get aborted() { return Atomics.load(cancelFlag, 0) === 1 } }
let lastPost = 0
function onProgress(fraction: number, label: string) {
  const now = Date.now()
  if (now - lastPost < 150 && fraction < 1) return
  lastPost = now
  parentPort!.postMessage({ type: 'progress', fraction, label })
}

try {
  const theory = parseTheory(task.theory)
  const heavy = () => enumerateHeavyTheory({ ...theory, heavy: theory.heavy && { ...theory.heavy, maxOrder: task.kind !== 'fingerprint' ? task.maxOrder ?? theory.heavy.maxOrder : theory.heavy.maxOrder } }, { onProgress, signal })
  const result = task.kind === 'fingerprint'
    ? typedFingerprints(theory, task.classKey, task.texts, task.priorities)
    : theory.frame === 'heavy'
      ? task.kind === 'count' ? { heavy: true, byOrder: heavyReport(heavy(), false) } : heavy()
      : task.kind === 'count'
        ? countOperators(theory, { maxDim: task.maxDim!, nf: task.nf, flavorPolynomials: true, onProgress, signal })
        : buildBasis(theory, { maxDim: task.maxDim!, nf: task.nf, priorities: task.priorities, onProgress, signal })
  parentPort!.postMessage({ type: 'done', result })
} catch (error) {
  parentPort!.postMessage(toThreadError(error))
}
