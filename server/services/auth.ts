import { Op, UniqueConstraintError } from 'sequelize'
import { passwordEmailProblem, REFRESH_TOKEN_TTL_SECONDS, type ResetBody, type SignInBody, type SignUpBody } from '../../shared/schemas/auth'
import type { User as UserDto } from '../../shared/schemas/user'
import { WORKSPACE_NAME_MAX_LENGTH } from '../../shared/schemas/workspace'
import { hashPassword, verifyPassword } from '../auth/passwords'
import { hashToken, randomToken, signAccessToken } from '../auth/tokens'
import type { AppContext } from '../context'
import { errors } from '../http/errors'
import { forgetSessions } from '../auth/session-cache'
import { PasswordReset, RefreshToken, User, UserSession } from '../models'
import { passwordResetMail } from './emails'
import { createWorkspace } from './workspaces'

export const RESET_TOKEN_TTL_MINUTES = 30

/** "Ada Lovelace's workspace", cut to the workspace name limit. */
export function personalWorkspaceName(userName: string): string {
  const suffix = "'s workspace"
  return `${userName.slice(0, WORKSPACE_NAME_MAX_LENGTH - suffix.length).trim()}${suffix}`
}

export interface Session {
  user: UserDto
  accessToken: string
  /** Goes into the httpOnly cookie, never into a body. */
  refreshToken: string
}

/** Tokens for a session: a new one (sign-in, sign-up, reset) unless the refresh names its own. */
async function issueSession(ctx: AppContext, user: User, sessionId?: string): Promise<Session> {
  const familyId = sessionId ?? (await UserSession.create({ userId: user.id })).id
  const refreshToken = randomToken()
  await RefreshToken.create({
    userId: user.id,
    familyId,
    tokenHash: hashToken(refreshToken),
    expiresAt: new Date(Date.now() + REFRESH_TOKEN_TTL_SECONDS * 1000),
  })
  return { user: user.toDto(), accessToken: signAccessToken(user.id, familyId, ctx.config.jwtSecret), refreshToken }
}

export async function signUp(ctx: AppContext, body: SignUpBody): Promise<Session> {
  const passwordHash = await hashPassword(body.password)
  try {
    // Everyone starts with a workspace of their own, so Save and Share work at once.
    const user = await ctx.sequelize.transaction(async (transaction) => {
      const created = await User.create({ email: body.email, name: body.name, passwordHash }, { transaction })
      await createWorkspace(ctx, created, personalWorkspaceName(created.name), transaction)
      return created
    })
    return await issueSession(ctx, user)
  } catch (err) {
    // Saying so reveals that the address has an account; sign-up cannot avoid it
    // without e-mail confirmation, and the rate limit bounds the probing.
    if (err instanceof UniqueConstraintError) {
      throw errors.conflict('An account with this e-mail address exists already; sign in instead', { email: 'This e-mail address is taken' })
    }
    throw err
  }
}

export async function signIn(ctx: AppContext, body: SignInBody): Promise<Session> {
  // Checked before the password, so a locked account's answer says nothing about it.
  const wait = ctx.signInGuard.lockedFor(body.email)
  if (wait) throw errors.rateLimited(wait, 'Too many failed sign-ins for this account; the password reset e-mail lifts the lock')
  const user = await User.findOne({ where: { email: body.email } })
  const ok = await verifyPassword(user?.passwordHash ?? null, body.password)
  if (!user || !ok) {
    ctx.signInGuard.failed(body.email)
    throw errors.invalidCredentials()
  }
  ctx.signInGuard.clear(body.email)
  return issueSession(ctx, user)
}

/**
 * Rotates a refresh token: the presented one is revoked and the next one of
 * its family issued. A revoked token presented again was stolen or replayed,
 * so the whole family is revoked and the caller must sign in again.
 */
export async function refresh(ctx: AppContext, token: string | undefined): Promise<Session> {
  if (!token) throw errors.unauthenticated('Your session has ended; sign in again')
  const row = await RefreshToken.findOne({ where: { tokenHash: hashToken(token) } })
  if (!row || row.expiresAt < new Date()) throw errors.unauthenticated('Your session has ended; sign in again')
  if (row.revokedAt) {
    await endSession(row.familyId)
    throw errors.unauthenticated('Your session has ended; sign in again')
  }
  const session = await UserSession.findByPk(row.familyId, { attributes: ['id', 'endedAt'] })
  if (!session || session.endedAt) throw errors.unauthenticated('Your session has ended; sign in again')
  // Conditional update: of two concurrent refreshes with one token, one wins.
  const [claimed] = await RefreshToken.update({ revokedAt: new Date() }, { where: { id: row.id, revokedAt: null } })
  if (claimed === 0) throw errors.unauthenticated('Your session has ended; sign in again')
  const user = await User.findByPk(row.userId)
  if (!user) throw errors.unauthenticated('Your session has ended; sign in again')
  return issueSession(ctx, user, row.familyId)
}

/** Ends a session: its refresh tokens are revoked and its access tokens refused from now on. */
async function endSession(sessionId: string): Promise<void> {
  const now = new Date()
  await RefreshToken.update({ revokedAt: now }, { where: { familyId: sessionId, revokedAt: null } })
  await UserSession.update({ endedAt: now }, { where: { id: sessionId, endedAt: null } })
  forgetSessions([sessionId])
}

/** Signs out the session of the refresh cookie: its access tokens stop working too. */
export async function signOut(token: string | undefined): Promise<void> {
  if (!token) return
  const row = await RefreshToken.findOne({ where: { tokenHash: hashToken(token) } })
  if (row) await endSession(row.familyId)
}

/**
 * Starts a reset. The caller answers 202 at once, whether or not the address
 * has an account: the work below runs detached so timing does not tell either.
 */
export function requestPasswordReset(ctx: AppContext, email: string): void {
  const work = async () => {
    const user = await User.findOne({ where: { email } })
    if (!user) return
    const token = randomToken()
    await PasswordReset.create({
      userId: user.id,
      tokenHash: hashToken(token),
      expiresAt: new Date(Date.now() + RESET_TOKEN_TTL_MINUTES * 60 * 1000),
    })
    const link = `${ctx.config.publicUrl}/reset?token=${encodeURIComponent(token)}`
    await ctx.mailer.send(passwordResetMail(user.email, user.name, link, RESET_TOKEN_TTL_MINUTES))
  }
  work().catch((err: unknown) => ctx.logger.error({ err }, 'password reset e-mail failed'))
}

/** Uses a reset token once: sets the password, ends every other session, signs in. */
export async function resetPassword(ctx: AppContext, body: ResetBody): Promise<Session> {
  const { user, ended } = await ctx.sequelize.transaction(async (transaction) => {
    const reset = await PasswordReset.findOne({
      where: { tokenHash: hashToken(body.token), usedAt: null, expiresAt: { [Op.gt]: new Date() } },
      transaction,
      lock: transaction.LOCK.UPDATE,
    })
    if (!reset) throw errors.invalidToken('password reset')
    const found = await User.findByPk(reset.userId, { transaction })
    if (!found) throw errors.invalidToken('password reset')
    const problem = passwordEmailProblem(body.password, found.email)
    if (problem) throw errors.validation({ password: problem })
    await reset.update({ usedAt: new Date() }, { transaction })
    await found.update({ passwordHash: await hashPassword(body.password) }, { transaction })
    await RefreshToken.update({ revokedAt: new Date() }, { where: { userId: found.id, revokedAt: null }, transaction })
    const [, ended] = await UserSession.update({ endedAt: new Date() }, { where: { userId: found.id, endedAt: null }, transaction, returning: true })
    return { user: found, ended: ended.map((e) => e.id) }
  })
  // After the commit, so that no request re-reads them as live in between.
  forgetSessions(ended)
  // Whoever holds the e-mailed link owns the account: its sign-in lockout ends.
  ctx.signInGuard.clear(user.email)
  return issueSession(ctx, user)
}
