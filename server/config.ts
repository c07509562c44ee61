/**
 * Everything the server reads from the environment, in one typed object.
 * The README's Configuration table lists the same names.
 */
import crypto from 'node:crypto'
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { dataDir, databaseUrl, mainCluster } from './db/cluster'
import type { MailLimits } from './services/mail-limits'

export interface ServerConfig {
  host: string
  port: number
  /** Base of the links in e-mails (reset, invitation). */
  publicUrl: string
  databaseUrl: string
  jwtSecret: string
  /** null: no real SMTP server, so the in-process sink receives every message. */
  smtpUrl: string | null
  /** Port of the in-process SMTP sink; 0 picks a free one. */
  smtpSinkPort: number
  mailFrom: string
  /** What an account may have the server e-mail (services/mail-limits.ts). */
  mailLimits: MailLimits
  /** Attempts per client address and window on sign-in, sign-up, forgot and reset. */
  authRateLimit: { max: number; windowMs: number }
  /** Failed sign-ins per account and window (auth/signin-guard.ts). */
  signInLimit: { perAccount: number; windowMs: number }
  logLevel: string
  /** null: the log goes to stdout; else this file, created readable by its owner only. */
  logFile: string | null
  /** Log one in this many share-link opens (1: all); errors of the others still log. */
  shareOpenLogEvery: number
  /** Share-link open counts are written every this many ms (0: only when the process stops). */
  shareCountFlushMs: number
  /** Folder of the built client (vite build); null serves no client (dev, tests). */
  clientDir: string | null
  /** Set the Secure flag on the refresh cookie (behind HTTPS). */
  secureCookies: boolean
  seedDemo: boolean
  /** The worker threads that compute saved versions' run summaries (services/run-pool.ts). */
  saveRuns: { threads: number; queue: number; perWorkspace: number; perAccount: number; timeLimitMs: number }
  /** The worker threads of other request work that can take long (services/work-pool.ts: version diffs, reading uploads). */
  work: { threads: number; queue: number; perOwner: number; perAccount: number; timeLimitMs: number }
}

/** One thread per core the request thread does not need, at least one, at most four. */
const defaultRunThreads = () => Math.min(4, Math.max(1, os.availableParallelism() - 1))

function intEnv(env: NodeJS.ProcessEnv, name: string, fallback: number): number {
  const raw = env[name]
  if (raw === undefined || raw === '') return fallback
  const n = Number(raw)
  if (!Number.isInteger(n) || n < 0) throw new Error(`${name} must be a non-negative integer, got "${raw}"`)
  return n
}

/**
 * JWT_SECRET wins; otherwise a random secret generated once into the data
 * folder (mode 600), so sign-ins survive restarts and nothing is committed.
 */
export function loadJwtSecret(env: NodeJS.ProcessEnv = process.env, folder: string = dataDir): string {
  if (env.JWT_SECRET) {
    if (env.JWT_SECRET.length < 32) throw new Error('JWT_SECRET must have at least 32 characters')
    return env.JWT_SECRET
  }
  const file = path.join(folder, 'jwt-secret')
  if (fs.existsSync(file)) return fs.readFileSync(file, 'utf8').trim()
  fs.mkdirSync(folder, { recursive: true })
  const secret = crypto.randomBytes(48).toString('base64url')
  try {
    fs.writeFileSync(file, `${secret}\n`, { mode: 0o600, flag: 'wx' })
    return secret
  } catch (err) {
    // Another process (the test server beside npm start) wrote it first: use theirs.
    if ((err as NodeJS.ErrnoException).code === 'EEXIST') return fs.readFileSync(file, 'utf8').trim()
    throw err
  }
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): ServerConfig {
  const host = env.HOST ?? '127.0.0.1'
  const port = intEnv(env, 'PORT', 3000)
  const production = env.NODE_ENV === 'production'
  return {
    host,
    port,
    publicUrl: (env.PUBLIC_URL ?? `http://${host}:${port}`).replace(/\/$/, ''),
    databaseUrl: env.DATABASE_URL ?? databaseUrl(mainCluster),
    jwtSecret: loadJwtSecret(env),
    smtpUrl: env.SMTP_URL || null,
    smtpSinkPort: intEnv(env, 'SMTP_SINK_PORT', 2525),
    mailFrom: env.MAIL_FROM ?? 'Chimeline <no-reply@chimeline.localhost>',
    mailLimits: {
      enabled: (env.MAIL_LIMITS ?? 'on') !== 'off',
      regular: {
        perHour: intEnv(env, 'MAIL_LIMIT_PER_HOUR', 50),
        perDay: intEnv(env, 'MAIL_LIMIT_PER_DAY', 200),
        recipientsPerMessage: Math.max(1, intEnv(env, 'MAIL_RECIPIENTS_MAX', 10)),
      },
      newAccountDays: intEnv(env, 'MAIL_NEW_ACCOUNT_DAYS', 3),
      newAccount: {
        perHour: intEnv(env, 'MAIL_NEW_ACCOUNT_PER_HOUR', 10),
        perDay: intEnv(env, 'MAIL_NEW_ACCOUNT_PER_DAY', 30),
        recipientsPerMessage: Math.max(1, intEnv(env, 'MAIL_NEW_ACCOUNT_RECIPIENTS_MAX', 3)),
      },
    },
    authRateLimit: {
      max: intEnv(env, 'AUTH_RATE_LIMIT_MAX', 10),
      windowMs: intEnv(env, 'AUTH_RATE_LIMIT_WINDOW_MS', 15 * 60 * 1000),
    },
    signInLimit: {
      perAccount: Math.max(1, intEnv(env, 'SIGNIN_ACCOUNT_LIMIT_MAX', 10)),
      windowMs: Math.max(1, intEnv(env, 'SIGNIN_ACCOUNT_LIMIT_WINDOW_MS', 15 * 60 * 1000)),
    },
    logLevel: env.LOG_LEVEL ?? (env.NODE_ENV === 'test' ? 'silent' : 'info'),
    logFile: env.LOG_FILE ? path.resolve(env.LOG_FILE) : null,
    shareOpenLogEvery: Math.max(1, intEnv(env, 'SHARE_OPEN_LOG_EVERY', 100)),
    shareCountFlushMs: intEnv(env, 'SHARE_COUNT_FLUSH_MS', 5000),
    clientDir: env.CLIENT_DIR === '' ? null : path.resolve(env.CLIENT_DIR ?? 'dist'),
    secureCookies: (env.PUBLIC_URL ?? '').startsWith('https:'),
    seedDemo: !production || env.CHIMELINE_SEED_DEMO === '1',
    saveRuns: {
      threads: Math.max(1, intEnv(env, 'SAVE_RUN_THREADS', defaultRunThreads())),
      queue: intEnv(env, 'SAVE_RUN_QUEUE', 16),
      perWorkspace: Math.max(1, intEnv(env, 'SAVE_RUN_PER_WORKSPACE', 3)),
      perAccount: Math.max(1, intEnv(env, 'SAVE_RUN_PER_ACCOUNT', 6)),
      timeLimitMs: Math.max(1, intEnv(env, 'SAVE_RUN_TIME_LIMIT_MS', 20_000)),
    },
    work: {
      threads: Math.max(1, intEnv(env, 'WORK_THREADS', 1)),
      queue: intEnv(env, 'WORK_QUEUE', 32),
      perOwner: Math.max(1, intEnv(env, 'WORK_PER_WORKSPACE', 4)),
      perAccount: Math.max(1, intEnv(env, 'WORK_PER_ACCOUNT', 8)),
      timeLimitMs: Math.max(1, intEnv(env, 'WORK_TIME_LIMIT_MS', 10_000)),
    },
  }
}
