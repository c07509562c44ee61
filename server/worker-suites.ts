/**
 * A suite worker: takes suite runs from their pg-boss queue, checks every
 * scenario of the suite (services/suite-runner.ts) and writes the run once,
 * with the timing model's version. A red run e-mails the suite's watchers
 * through the share e-mails' path and limits (mail-limits.ts: the budget of
 * the member who started the run); a run over the limit says so in its
 * message and sends nothing.
 */
import type PgBoss from 'pg-boss'
import type { Logger } from 'pino'
import { Op } from 'sequelize'
import { MODEL_VERSION } from '../shared/sim/timing/version'
import type { ServerConfig } from './config'
import { Membership, Scenario, Suite, SuiteRun, User } from './models'
import type { Mailer } from './services/mailer'
import { reserveMail } from './services/mail-limits'
import { contentOf } from './services/scenarios'
import { suiteRunMail } from './services/suite-mail'
import { runSuiteScenarios, type SuiteRunOptions, type SuiteOutcome } from './services/suite-runner'
import { SUITE_QUEUE, startSuiteBoss, type SuiteRunJob } from './services/suites-queue'
import type { Sequelize } from 'sequelize'

export interface SuiteWorkerOptions extends SuiteRunOptions {
  config: ServerConfig
  sequelize: Sequelize
  mailer: Mailer
  logger: Logger
  /** The engine's model version recorded with each run (a test stands in a bumped one). */
  modelVersion?: number
}

export interface SuiteWorker {
  stop(): Promise<void>
}

/** The run's address in the app. */
export function suiteRunUrl(config: Pick<ServerConfig, 'publicUrl'>, suiteId: string, runId: string): string {
  return `${config.publicUrl}/suites/${suiteId}?run=${runId}`
}

async function mailWatchers(o: SuiteWorkerOptions, suite: Suite, run: SuiteRun, outcome: SuiteOutcome, modelVersion: number): Promise<string | null> {
  const members = await Membership.findAll({ where: { workspaceId: suite.workspaceId, userId: { [Op.in]: suite.watcherIds } }, attributes: ['userId'] })
  const watchers = await User.findAll({ where: { id: members.map((m) => m.userId) }, attributes: ['id', 'email'] })
  if (!watchers.length) return null
  const starter = run.startedById ? await User.findByPk(run.startedById) : null
  if (!starter) return 'watchers not e-mailed: the member who started the run is gone'
  try {
    await reserveMail(o, starter, 'suite-run', watchers.length)
  } catch (err) {
    return `watchers not e-mailed: ${(err as Error).message}`
  }
  const failures = outcome.entries.flatMap((e) => e.results.filter((r) => !r.pass).map((r) => `${e.title} › ${r.text} (measured ${r.measured ?? 'none'})`)).slice(0, 10)
  const url = suiteRunUrl(o.config, suite.id, run.id)
  try {
    for (const w of watchers) await o.mailer.send(suiteRunMail({ to: w.email, suite: suite.title, failed: outcome.failed, total: outcome.failed + outcome.passed, modelVersion, failures, url }))
  } catch (err) {
    o.logger.warn({ err, run: run.id }, 'suite run mail not sent')
    return 'watchers not e-mailed: the mail server did not take the message'
  }
  return `e-mailed ${watchers.length} watcher(s)`
}

/** Runs one queued suite run to its end; exported for tests that drive it without the queue. */
export async function runSuiteJob(o: SuiteWorkerOptions, job: SuiteRunJob): Promise<void> {
  const run = await SuiteRun.findByPk(job.runId)
  if (!run || (run.status !== 'queued' && run.status !== 'running')) return
  const suite = await Suite.findByPk(run.suiteId)
  if (!suite) return
  const modelVersion = o.modelVersion ?? MODEL_VERSION
  await run.update({ status: 'running', modelVersion })
  const rows = await Scenario.findAll({ where: { id: suite.scenarioIds, workspaceId: suite.workspaceId } })
  const byId = new Map(rows.map((s) => [s.id, s]))
  const outcome = runSuiteScenarios(
    suite.scenarioIds.map((id) => {
      const s = byId.get(id)
      return { id, found: s ? { title: s.title, version: s.version, content: contentOf(s) } : null }
    }),
    run.presetId,
    o,
  )
  const status = outcome.red ? 'failed' : 'passed'
  // Written once: a job retried after its worker died finds the run finished and stops above.
  const [written] = await SuiteRun.update(
    { status, entries: outcome.entries, passed: outcome.passed, failed: outcome.failed, finishedAt: new Date() },
    { where: { id: run.id, status: { [Op.in]: ['queued', 'running'] } } },
  )
  if (!written) return
  o.logger.info({ suite: suite.id, run: run.id, status, failed: outcome.failed }, 'suite run done')
  if (outcome.red) {
    const message = await mailWatchers(o, suite, run, outcome, modelVersion)
    if (message) await SuiteRun.update({ message }, { where: { id: run.id } })
  }
}

/** Starts taking suite runs; the models must be bound to `sequelize` (connect()). */
export async function startSuiteWorker(o: SuiteWorkerOptions): Promise<SuiteWorker> {
  const boss: PgBoss = await startSuiteBoss(o.config.databaseUrl)
  await boss.work<SuiteRunJob>(SUITE_QUEUE, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async (jobs) => {
    for (const job of jobs) {
      try {
        await runSuiteJob(o, job.data)
      } catch (err) {
        o.logger.error({ err, run: job.data.runId }, 'suite run failed')
        await SuiteRun.update({ status: 'error', message: 'the worker could not finish this run', finishedAt: new Date() }, { where: { id: job.data.runId, status: { [Op.in]: ['queued', 'running'] } } })
      }
    }
  })
  return {
    async stop() {
      await boss.stop({ graceful: true, wait: true, timeout: 10_000 })
    },
  }
}
