import { monitorEventLoopDelay } from 'node:perf_hooks'

// The event loop's longest stall since the previous reading, for the health route: the one
// figure that shows whether anything computes on the request thread (issue 12). A stall also
// counts the time the operating system gave the process no CPU.
let histogram: ReturnType<typeof monitorEventLoopDelay> | undefined

/** The longest stall (ms) since the last call (or since start-up), then start a fresh window. */
export function longestStallSinceLastReading(): number {
  if (!histogram) {
    histogram = monitorEventLoopDelay({ resolution: 10 })
    histogram.enable()
    return 0
  }
  const ms = Math.round(histogram.max / 1e6)
  histogram.reset()
  return ms
}
