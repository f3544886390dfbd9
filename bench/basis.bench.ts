/**
 * Benchmark of the explicit on-shell basis (server/engine/basis).
 * Targets: SMEFT dimension 6, one flavor, explicit and tally-checked under 10 s; dimension 8
 * (one flavor) under 120 s. Also: dimensions 6 and 8 with three flavors, the number of progress
 * events and the time from abort to EngineCancelledError (worker-thread friendliness).
 * Returns median wall times (ms), with the total real parameters as a correctness stamp.
 */
import { findPreset } from '../shared/presets/index'
import { parseTheory } from '../server/engine/theory/parseTheory'
import { buildBasis } from '../server/engine/basis/index'
import { median } from './support/timing'

const round = (x: number): number => Math.round(x * 10) / 10

function measure(maxDim: number, nf: number, repeats: number, target: number) {
  const smeft = parseTheory(findPreset('smeft')!.theory)
  const times: number[] = []
  let top = 0
  let ok = true
  let events = 0
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now()
    const r = buildBasis(smeft, {
      minDim: maxDim,
      maxDim,
      nf,
      onProgress: () => {
        events++
      },
    })
    times.push(performance.now() - t0)
    top = r.byDimension.at(-1)!.operators
    ok &&= r.byDimension.every((d) => d.tallyOk)
  }
  return { median_ms: round(median(times)), repeats, real_parameters: top, tally_ok: ok, progress_events: events / repeats, target_ms: target }
}

function cancelLatency() {
  const smeft = parseTheory(findPreset('smeft')!.theory)
  const signal = { aborted: false }
  let abortedAt = 0
  const t0 = performance.now()
  try {
    buildBasis(smeft, {
      maxDim: 8,
      minDim: 8,
      nf: 1,
      signal,
      onProgress: () => {
        if (!signal.aborted && performance.now() - t0 > 500) {
          signal.aborted = true
          abortedAt = performance.now()
        }
      },
    })
  } catch (e) {
    if ((e as Error).name !== 'EngineCancelledError') throw e
  }
  return { median_ms: round(performance.now() - abortedAt), repeats: 1 }
}

export default async function basisBench(): Promise<Record<string, unknown>> {
  return {
    smeft_dim6_nf1: measure(6, 1, 3, 10_000),
    smeft_dim6_nf3: measure(6, 3, 3, 10_000),
    smeft_dim8_nf1: measure(8, 1, 1, 120_000),
    smeft_dim8_nf3: measure(8, 3, 1, 120_000),
    cancel_latency: cancelLatency(),
  }
}
