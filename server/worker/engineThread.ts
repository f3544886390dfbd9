// Worker-thread entry: runs one engine task off the main thread. The cancel flag is a shared
// Int32Array, because the engine's loops are synchronous and would never see a message event.
import { parentPort, workerData } from 'node:worker_threads'
import { countOperators } from '../engine/counting/countOperators'
import { buildBasis } from '../engine/basis/buildBasis'
import { orderZeroHeavy } from '../engine/basis/orderZero'
import { typedFingerprints } from '../engine/board/typedOperator'
import { enumerateHeavyTheory } from '../engine/heavy/enumerate'
import { heavyReport } from '../engine/heavy/report'
import { goldstoneTask } from '../engine/goldstone/task'
import { parseTheory } from '../engine/theory/parseTheory'
import type { EngineTask } from './engineTask'
import { toThreadError } from './threadError'

const { task, cancelFlag } = workerData as { task: EngineTask; cancelFlag: Int32Array }
const signal = {
  get aborted() {
    return Atomics.load(cancelFlag, 0) === 1
  },
}
let lastPost = 0
function onProgress(fraction: number, label: string) {
  const now = Date.now()
  if (now - lastPost < 150 && fraction < 1) return
  lastPost = now
  parentPort!.postMessage({ type: 'progress', fraction, label })
}

function run(t: EngineTask): unknown {
  const theory = parseTheory(t.theory)
  if (theory.frame === 'goldstone') return goldstoneTask(theory, t, { onProgress, signal })
  if (t.kind === 'fingerprint') return typedFingerprints(theory, t.classKey, t.texts, t.priorities)
  if (theory.frame === 'heavy') {
    const heavy = () => enumerateHeavyTheory({ ...theory, heavy: theory.heavy && { ...theory.heavy, maxOrder: t.maxOrder ?? theory.heavy.maxOrder } }, { onProgress, signal })
    return t.kind === 'count' ? { heavy: true, byOrder: heavyReport(heavy(), false) } : { ...heavy(), orderZero: orderZeroHeavy(theory, { signal }) }
  }
  return t.kind === 'count'
    ? countOperators(theory, { maxDim: t.maxDim!, nf: t.nf, flavorPolynomials: true, onProgress, signal })
    : buildBasis(theory, { maxDim: t.maxDim!, nf: t.nf, priorities: t.priorities, onProgress, signal, orderZero: true })
}

try {
  const result = run(task)
  parentPort!.postMessage({ type: 'done', result })
} catch (error) {
  parentPort!.postMessage(toThreadError(error))
}
