/**
 * Integration-test harness: a real server (Express app, PostgreSQL test
 * database, in-process SMTP sink on a free port) and small factories.
 * Outline-style `buildX(overrides)` factories; unique e-mails per call, so test
 * files share the database without cleaning up after each other.
 */
import crypto from 'node:crypto'
import { Op } from 'sequelize'
import { hashPassword } from '../../server/auth/passwords'
import { signAccessToken } from '../../server/auth/tokens'
import { loadConfig, type ServerConfig } from '../../server/config'
import { databaseUrl, testCluster } from '../../server/db/cluster'
import { Membership, OutboxMessage, User, UserSession, Workspace } from '../../server/models'
import { createRuntime, type Runtime } from '../../server/runtime'
import type { SiteRole } from '../../shared/schemas/user'
import type { WorkspaceRole } from '../../shared/schemas/workspace'
import { prepareCluster } from '../../scripts/db'

process.env.TZ = 'UTC'

/**
 * Starts the test cluster if needed (scripts/test.sh has usually done it) and
 * builds a server. Pass `shareWith` for a second server in the same file: it
 * reuses that one's database connection.
 */
export async function startTestServer(overrides: Partial<ServerConfig> = {}, shareWith?: Runtime): Promise<Runtime> {
  await prepareCluster(testCluster)
  const config: ServerConfig = {
    ...loadConfig({
      NODE_ENV: 'test',
      DATABASE_URL: databaseUrl(testCluster),
      JWT_SECRET: 'integration-tests-only-secret-0123456789abcdef',
      SMTP_SINK_PORT: '0',
      CLIENT_DIR: '',
      PUBLIC_URL: 'http://127.0.0.1:3100',
      AUTH_RATE_LIMIT_MAX: '1000',
      SIGNIN_ACCOUNT_LIMIT_MAX: '1000',
      // Factory users are all new accounts; tests/server/mail-limits.test.ts turns the limits on.
      MAIL_LIMITS: 'off',
    }),
    ...overrides,
  }
  return createRuntime(config, { sequelize: shareWith?.ctx.sequelize })
}

export const TEST_PASSWORD = 'correct-horse-battery'

export interface BuiltUser {
  user: User
  password: string
  /** A valid access token for the Authorization header. */
  token: string
  auth: { Authorization: string }
}

export function uniqueEmail(prefix = 'user'): string {
  return `${prefix}-${crypto.randomUUID().slice(0, 8)}@example.test`
}

let sharedHash: Promise<string> | null = null

export async function buildUser(runtime: Runtime, overrides: { role?: SiteRole; email?: string; name?: string } = {}): Promise<BuiltUser> {
  // One argon2 hash for all factory users keeps the suite fast; sign-up tests hash for real.
  sharedHash ??= hashPassword(TEST_PASSWORD)
  const user = await User.create({
    email: overrides.email ?? uniqueEmail(overrides.role ?? 'member'),
    name: overrides.name ?? 'Test Person',
    role: overrides.role ?? 'member',
    passwordHash: await sharedHash,
  })
  const session = await UserSession.create({ userId: user.id })
  const token = signAccessToken(user.id, session.id, runtime.ctx.config.jwtSecret)
  return { user, password: TEST_PASSWORD, token, auth: { Authorization: `Bearer ${token}` } }
}

export async function buildWorkspace(members: { user: User; role: WorkspaceRole }[], name = 'Test workspace'): Promise<Workspace> {
  const workspace = await Workspace.create({ name })
  for (const m of members) await Membership.create({ workspaceId: workspace.id, userId: m.user.id, role: m.role })
  return workspace
}

/** Polls the Outbox table for a message to `to` received after `since`. */
export async function waitForMail(to: string, since: Date, timeoutMs = 5000): Promise<OutboxMessage> {
  const deadline = Date.now() + timeoutMs
  for (;;) {
    const found = await OutboxMessage.findOne({
      where: { to: { [Op.contains]: [to] }, receivedAt: { [Op.gte]: since } },
      order: [['receivedAt', 'DESC']],
    })
    if (found) return found
    if (Date.now() > deadline) throw new Error(`no e-mail to ${to} within ${timeoutMs} ms`)
    await new Promise((resolve) => setTimeout(resolve, 50))
  }
}

/** The token of the first link in a message's text, e.g. /reset?token=... */
export function linkToken(text: string, route: string): string {
  const match = new RegExp(`https?://[^\\s]+${route}\\?token=([A-Za-z0-9_-]+)`).exec(text)
  if (!match?.[1]) throw new Error(`no ${route} link in:\n${text}`)
  return match[1]
}

/** The value of a Set-Cookie header for one cookie, or undefined. */
export function cookieFrom(setCookie: string[] | string | undefined, name: string): string | undefined {
  const list = setCookie === undefined ? [] : Array.isArray(setCookie) ? setCookie : [setCookie]
  return list.find((c) => c.startsWith(`${name}=`))
}
