import { Worker } from 'node:worker_threads'
import { EngineError } from '../../engine/errors'
import { fromThreadError, type ThreadErrorMessage } from '../../worker/threadError'
import { ComputeBudgetError, ComputeBusyError } from './computeErrors'
import { computeThreadEntry } from './threadEntry'

export interface LaneLimits {
  /** Threads at most (each computes one task at a time). */
  threads: number
  /** Tasks waiting for a thread at most; one more is refused with 429. */
  queue: number
  /** Tasks (waiting or computing) of one user at most; one more is refused with 429. */
  perUser: number
  /** Tasks (waiting or computing) for one group at most, whoever asked; one more is refused with 429. */
  perGroup: number
  /** A thread idle this long ends (its memory is returned); the lane's first thread stays. */
  idleMs: number
}
interface Job {
  id: number
  kind: string
  input: unknown
  user: string
  group?: string
  budgetMs: number
  what: string
  resolve: (v: unknown) => void
  reject: (e: Error) => void
}
interface Slot {
  worker: Worker
  ready: boolean
  job?: Job
  timer?: NodeJS.Timeout
  idle?: NodeJS.Timeout
}

/**
 * A small bounded pool of engine threads with a wait queue: the event loop only sends inputs
 * and receives results. A task over its time budget ends its thread (synchronous engine loops
 * cannot be interrupted otherwise); a fresh thread takes the next task.
 */
export class ComputeLane {
  private slots: Slot[] = []
  private waiting: Job[] = []
  private perUser = new Map<string, number>()
  private perGroup = new Map<string, number>()
  /** When each owner (group, else person) with work here last had a task started (a counter). */
  private lastTurn = new Map<string, number>()
  private turns = 0
  private nextId = 1
  constructor(
    readonly name: string,
    readonly limits: LaneLimits,
  ) {}

  /** Start the first thread now: booting one (tsx and the engine) takes seconds of CPU. */
  warm() {
    if (!this.slots.length) this.finish(this.spawn())
  }

  get stats() {
    return { threads: this.slots.length, busy: this.slots.filter((s) => s.job).length, waiting: this.waiting.length }
  }

  run(kind: string, input: unknown, opts: { user: string; group?: string; budgetMs: number; what: string }): Promise<unknown> {
    const mine = this.perUser.get(opts.user) ?? 0
    if (mine >= this.limits.perUser) {
      throw new ComputeBusyError(`You already have ${mine} ${this.name} in progress (the limit is ${this.limits.perUser} at a time); wait for them to finish, then try again`, 2)
    }
    const ours = opts.group === undefined ? 0 : (this.perGroup.get(opts.group) ?? 0)
    if (ours >= this.limits.perGroup) {
      throw new ComputeBusyError(`Your group already has ${ours} ${this.name} in progress (the limit is ${this.limits.perGroup} per group at a time); wait for them to finish, then try again`, 2)
    }
    const free = this.slots.some((s) => !s.job) || this.slots.length < this.limits.threads
    if (!free && this.waiting.length >= this.limits.queue) {
      throw new ComputeBusyError(`The server is busy: ${this.waiting.length} ${this.name} are waiting for a thread (the limit is ${this.limits.queue}); try again in a few seconds`, 5)
    }
    const keys = [count(this.perUser, opts.user), ...(opts.group === undefined ? [] : [count(this.perGroup, opts.group)])]
    return new Promise((resolve, reject) => {
      this.waiting.push({ id: this.nextId++, kind, input, ...opts, resolve, reject })
      this.pump()
    }).finally(() => {
      for (const release of keys) release()
    })
  }

  private pump() {
    while (this.waiting.length) {
      const slot = this.slots.find((s) => !s.job) ?? (this.slots.length < this.limits.threads ? this.spawn() : undefined)
      if (!slot) return
      this.start(slot, this.waiting.splice(this.nextTurn(), 1)[0]!)
    }
  }

  /**
   * Groups take turns: the next task is the longest-waiting one of the group (or, without a
   * group, the person) with the fewest tasks computing now and, among those, whose last turn
   * is the oldest; so one group's burst does not hold up another group's single task.
   */
  private nextTurn(): number {
    const computing = new Map<string, number>()
    for (const s of this.slots) if (s.job) computing.set(owner(s.job), (computing.get(owner(s.job)) ?? 0) + 1)
    const rank = (job: Job) => [computing.get(owner(job)) ?? 0, this.lastTurn.get(owner(job)) ?? -1] as const
    let best = 0
    for (let i = 1; i < this.waiting.length; i++) {
      const [c, t] = rank(this.waiting[i]!)
      const [bc, bt] = rank(this.waiting[best]!)
      if (c < bc || (c === bc && t < bt)) best = i
    }
    const chosen = owner(this.waiting[best]!)
    this.lastTurn.set(chosen, this.turns++)
    // Forget owners with nothing here any more (the map stays as small as the queue).
    const present = new Set([...this.waiting, ...this.slots.flatMap((s) => (s.job ? [s.job] : []))].map(owner))
    for (const o of this.lastTurn.keys()) if (!present.has(o)) this.lastTurn.delete(o)
    return best
  }

  private start(slot: Slot, job: Job) {
    clearTimeout(slot.idle)
    slot.job = job
    slot.worker.postMessage({ id: job.id, kind: job.kind, input: job.input })
    if (slot.ready) this.startBudget(slot, job)
  }

  /** The budget counts computing time only: it starts once the thread has loaded the engine. */
  private startBudget(slot: Slot, job: Job) {
    slot.timer = setTimeout(() => {
      this.retire(slot)
      job.reject(
        new ComputeBudgetError(
          `${job.what} takes longer than its budget of ${job.budgetMs / 1000} s, so the server stopped it. Ask for less (fewer orders, smaller powers or shorter numbers), or start a background run where there is one`,
        ),
      )
    }, job.budgetMs)
  }

  private spawn(): Slot {
    const slot: Slot = { worker: new Worker(computeThreadEntry()), ready: false }
    slot.worker.unref()
    slot.worker.on('message', (msg: { id: number; ok: boolean; ready?: boolean; result?: unknown; error?: ThreadErrorMessage }) => {
      const job = slot.job
      if (msg.ready) {
        slot.ready = true
        if (job) this.startBudget(slot, job)
        return
      }
      if (!job || job.id !== msg.id) return
      this.finish(slot)
      if (msg.ok) job.resolve(msg.result)
      else job.reject(fromThreadError(msg.error!))
    })
    slot.worker.on('error', (error) => {
      const job = slot.job
      this.retire(slot)
      job?.reject(error as Error)
    })
    slot.worker.on('exit', (code) => {
      const job = slot.job
      this.retire(slot)
      job?.reject(new EngineError(`engine thread exited with code ${code}`))
    })
    this.slots.push(slot)
    return slot
  }

  private finish(slot: Slot) {
    clearTimeout(slot.timer)
    slot.job = undefined
    slot.idle = setTimeout(() => {
      if (this.slots[0] !== slot) this.retire(slot)
    }, this.limits.idleMs)
    slot.idle.unref()
    this.pump()
  }

  /** Take a thread out of the pool and end it; its task (if any) is settled by the caller. */
  private retire(slot: Slot) {
    if (!this.slots.includes(slot)) return
    clearTimeout(slot.timer)
    clearTimeout(slot.idle)
    slot.job = undefined
    this.slots = this.slots.filter((s) => s !== slot)
    void slot.worker.terminate()
    this.pump()
  }
}

/** Whose turn a task counts for: its group's, else its person's. */
const owner = (job: Job) => (job.group === undefined ? `user:${job.user}` : `group:${job.group}`)

/** Count one more task under `key`; the function returned counts it off again. */
function count(counts: Map<string, number>, key: string): () => void {
  counts.set(key, (counts.get(key) ?? 0) + 1)
  return () => {
    const n = (counts.get(key) ?? 1) - 1
    if (n > 0) counts.set(key, n)
    else counts.delete(key)
  }
}
