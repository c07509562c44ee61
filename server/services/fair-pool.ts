/**
 * Worker threads shared fairly between owners (workspaces). CPU work that
 * could hold the request thread (a save's run, a version diff) goes to a
 * small piscina pool through this scheduler, which keeps three promises:
 *
 * - bounded: at most `perOwner` tasks of one owner in flight (running or
 *   waiting) and at most `queue` waiting in all; one more is a 503
 *   `server_busy` with Retry-After, and the caller does nothing else;
 * - fair: a free thread takes the next task of the next owner in turn
 *   (round robin), so one workspace's burst waits behind itself, not in
 *   front of everybody else;
 * - a time limit per task, counted from when a thread starts it: a task over
 *   it is stopped (its thread terminated) and the caller learns it.
 *
 * The scheduler hands piscina at most `threads` tasks at once, so piscina's
 * own FIFO queue never decides the order.
 */
import { createRequire } from 'node:module'
import { pathToFileURL } from 'node:url'
import { MessageChannel, type MessagePort } from 'node:worker_threads'
import { Piscina } from 'piscina'
import { ApiError } from '../http/errors'

export interface FairPoolLimits {
  /** Worker threads at most (one from the first task on; more on demand, stopped after a minute idle). */
  threads: number
  /** Tasks that may wait for a thread, all owners together. */
  queue: number
  /** Tasks of one owner in flight (running and waiting). */
  perOwner: number
  /**
   * Tasks of one account in flight, over all its owners: an account may make
   * any number of workspaces, and must not fill the queue through them.
   */
  perAccount: number
  /** Wall-clock limit of one task, from its start on a thread. */
  timeLimitMs: number
}

/** What a worker module's default export receives: the task and the port on which it says it started. */
export interface Started {
  started: MessagePort
}

/** Thrown by run() when a task went over the time limit (its thread was stopped). */
export class TaskTimeLimit extends Error {}

export interface FairPool<T, R> {
  /** Runs a task for an owner (a workspace), asked by an account (a user). */
  run(task: T, owner: string, account: string): Promise<R>
  /** Tasks in flight (running and waiting). */
  readonly inFlight: number
  /** Tasks handed to a thread since the pool was made (tests use it to prove where work ran, or that it was skipped). */
  readonly started: number
  close(): Promise<void>
}

interface Job<T, R> {
  task: T
  owner: string
  account: string
  resolve: (r: R) => void
  reject: (e: unknown) => void
}

const tsxLoader = pathToFileURL(createRequire(import.meta.url).resolve('tsx')).href

/** Seconds a refused caller should wait: about one task's turn. */
const RETRY_AFTER_SECONDS = 5

export function createFairPool<T extends object, R>(workerUrl: URL, limits: FairPoolLimits, what: string): FairPool<T, R> {
  // Made on the first task, so a process that never needs it starts no thread. One
  // thread stays up from then on: piscina refills only up to minThreads after a
  // task is stopped.
  let pool: Piscina<T & Started, R> | null = null
  const threads = () =>
    (pool ??= new Piscina<T & Started, R>({
      filename: workerUrl.href,
      minThreads: 1,
      maxThreads: limits.threads,
      idleTimeout: 60_000,
      execArgv: ['--import', tsxLoader],
    }))

  const waiting = new Map<string, Job<T, R>[]>()
  /** Owners with waiting tasks, in turn order. */
  const ring: string[] = []
  const perOwner = new Map<string, number>()
  const perAccount = new Map<string, number>()
  /** When each owner with tasks in flight last had one started (a counter, not a clock). */
  const lastServed = new Map<string, number>()
  let serves = 0
  let running = 0
  let queued = 0
  let started = 0

  function busy(message: string): ApiError {
    return new ApiError(503, 'server_busy', message, undefined, RETRY_AFTER_SECONDS)
  }

  /**
   * The waiting owner served longest ago (never served first, then in order
   * of arrival): an owner whose task just started goes behind the others
   * even if its next task was queued before theirs.
   */
  function nextOwner(): string {
    let best = 0
    for (let i = 1; i < ring.length; i++) {
      if ((lastServed.get(ring[i] as string) ?? -1) < (lastServed.get(ring[best] as string) ?? -1)) best = i
    }
    return ring.splice(best, 1)[0] as string
  }

  function next(): void {
    while (running < limits.threads && ring.length) {
      const owner = nextOwner()
      const jobs = waiting.get(owner) as Job<T, R>[]
      const job = jobs.shift() as Job<T, R>
      queued--
      if (jobs.length) ring.push(owner)
      else waiting.delete(owner)
      lastServed.set(owner, ++serves)
      running++
      started++
      execute(job).finally(() => {
        running--
        const n = (perOwner.get(job.owner) ?? 1) - 1
        if (n) perOwner.set(job.owner, n)
        else {
          perOwner.delete(job.owner)
          lastServed.delete(job.owner)
        }
        const a = (perAccount.get(job.account) ?? 1) - 1
        if (a) perAccount.set(job.account, a)
        else perAccount.delete(job.account)
        next()
      })
    }
  }

  async function execute(job: Job<T, R>): Promise<void> {
    const stop = new AbortController()
    const { port1, port2 } = new MessageChannel()
    let timer: NodeJS.Timeout | undefined
    port1.once('message', () => {
      timer = setTimeout(() => stop.abort(), limits.timeLimitMs)
    })
    try {
      job.resolve(await threads().run({ ...job.task, started: port2 }, { transferList: [port2], signal: stop.signal }))
    } catch (err) {
      job.reject(stop.signal.aborted ? new TaskTimeLimit(`over ${limits.timeLimitMs} ms`) : err)
    } finally {
      clearTimeout(timer)
      port1.close()
    }
  }

  function run(task: T, owner: string, account: string): Promise<R> {
    const mine = perOwner.get(owner) ?? 0
    if (mine >= limits.perOwner) {
      return Promise.reject(busy(`This workspace has ${mine} ${what} in progress already, its share of the server; nothing was done: try again in a moment`))
    }
    const theirs = perAccount.get(account) ?? 0
    if (theirs >= limits.perAccount) {
      return Promise.reject(busy(`Your account has ${theirs} ${what} in progress already, its share of the server; nothing was done: try again in a moment`))
    }
    if (running >= limits.threads && queued >= limits.queue) {
      return Promise.reject(busy(`The server is busy with ${running + queued} ${what}, its limit; nothing was done: try again in a moment`))
    }
    perOwner.set(owner, mine + 1)
    perAccount.set(account, theirs + 1)
    return new Promise<R>((resolve, reject) => {
      const job = { task, owner, account, resolve, reject }
      const jobs = waiting.get(owner)
      if (jobs) jobs.push(job)
      else {
        waiting.set(owner, [job])
        ring.push(owner)
      }
      queued++
      next()
    })
  }

  return {
    run,
    get inFlight() {
      return running + queued
    },
    get started() {
      return started
    },
    close: async () => {
      await pool?.destroy()
    },
  }
}
