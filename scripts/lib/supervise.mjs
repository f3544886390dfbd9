// Keep a child process alive: when it dies, say why (exit code or signal) and start it again
// after a delay that doubles while it keeps dying young (1 s, 2 s, 4 s … at most 30 s) and
// returns to 1 s once it has lived a minute.

/** How a child ended, in words for the log. */
export function describeExit(code, signal) {
  if (signal === 'SIGKILL') return 'killed by SIGKILL (kill -9, or the system ran out of memory)'
  if (signal) return `killed by ${signal}`
  return `exited with code ${code}`
}

/**
 * @param {string} name e.g. 'worker'
 * @param {() => import('node:child_process').ChildProcess} spawnChild starts one child
 * @param {{ log?: (line: string) => void, firstDelayMs?: number, maxDelayMs?: number, healthyAfterMs?: number }} options
 */
export function supervise(name, spawnChild, options = {}) {
  const { log = (line) => console.error(line), firstDelayMs = 1000, maxDelayMs = 30_000, healthyAfterMs = 60_000 } = options
  let delay = firstDelayMs
  let stopping = false
  let child
  let timer
  const state = { restarts: 0, pids: [] }

  function start() {
    const startedAt = Date.now()
    child = spawnChild()
    state.pids.push(child.pid)
    child.on('exit', (code, signal) => {
      if (stopping) return
      if (Date.now() - startedAt >= healthyAfterMs) delay = firstDelayMs
      log(`[supervisor] the ${name} (pid ${child.pid}) stopped: ${describeExit(code, signal)}; restarting it in ${delay / 1000} s`)
      timer = setTimeout(() => {
        state.restarts += 1
        start()
      }, delay)
      delay = Math.min(maxDelayMs, delay * 2)
    })
  }
  start()

  return {
    state,
    get pid() {
      return child?.pid
    },
    /** Stop supervising and end the child with `signal`; resolves when it has exited. */
    stop(signal = 'SIGTERM') {
      stopping = true
      clearTimeout(timer)
      if (!child || child.exitCode !== null || child.signalCode !== null) return Promise.resolve()
      return new Promise((resolve) => {
        child.once('exit', () => resolve())
        child.kill(signal)
      })
    },
  }
}
