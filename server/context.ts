import type { Logger } from 'pino'
import type { Sequelize } from 'sequelize'
import type { SignInGuard } from './auth/signin-guard'
import type { ServerConfig } from './config'
import type { Mailer } from './services/mailer'
import type { RunPool } from './services/run-pool'
import type { WorkPool } from './services/work-pool'
import type { ShareOpens } from './services/share-links-open'
import type { SuiteQueue } from './services/suites-queue'
import type { SweepQueue } from './services/sweeps-queue'

/** What routes and services need from the running server; built once in runtime.ts. */
export interface AppContext {
  config: ServerConfig
  sequelize: Sequelize
  mailer: Mailer
  logger: Logger
  /** Computes saved versions' run summaries on worker threads. */
  runs: RunPool
  /** Other request work that can take long (version diffs, reading uploads), on worker threads with a time limit. */
  work: WorkPool
  /** Failed sign-ins per account. */
  signInGuard: SignInGuard
  /** Opens share links from an in-memory cache; counts opens and writes them every few seconds. */
  shares: ShareOpens
  /** Queues server sweeps as chunks for the worker processes (pg-boss, started on first use). */
  sweeps: SweepQueue
  /** Queues suite runs for the worker processes (pg-boss, started on first use). */
  suites: SuiteQueue
}
