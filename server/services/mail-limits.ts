/**
 * Limits on what an account can make the server e-mail (share links,
 * invitations, red suite runs it started): recipients per message, and messages per hour and per day,
 * stricter for accounts younger than `newAccountDays`. A self-signed-up
 * account once sent 341 messages in 38 s with text of its choosing; now a
 * request over a limit sends nothing and answers 429 with Retry-After (or 400
 * naming `to` for too many recipients, which waiting does not fix).
 *
 * Each allowed request is recorded (mail_sends) under a per-account advisory
 * lock, so concurrent requests cannot overdraw the budget together.
 */
import { Op } from 'sequelize'
import type { AppContext } from '../context'
import { ApiError, errors } from '../http/errors'
import { MailSend, type User } from '../models'

export interface MailBudget {
  perHour: number
  perDay: number
  recipientsPerMessage: number
}

export interface MailLimits {
  enabled: boolean
  regular: MailBudget
  /** For accounts younger than newAccountDays. */
  newAccount: MailBudget
  newAccountDays: number
}

const HOUR_MS = 3_600_000
const DAY_MS = 24 * HOUR_MS

/**
 * Records that `user` sends `recipients` messages of this kind, or throws
 * without recording. Call it before sending anything.
 */
export async function reserveMail(ctx: Pick<AppContext, 'config' | 'sequelize'>, user: User, kind: MailSend['kind'], recipients: number): Promise<void> {
  const limits = ctx.config.mailLimits
  if (!limits.enabled) return
  const { budget, who } = budgetOf(limits, user)
  if (recipients > budget.recipientsPerMessage) {
    throw errors.validation({ to: `At most ${budget.recipientsPerMessage} address(es) per message for ${who}` }, 'Too many recipients for one message')
  }
  await record(ctx, user, kind, recipients, budget, who, false)
}

/**
 * Records that `user` sends `messages` separate messages of one recipient
 * each (a class's invitations), all or none: the per-message recipient cap
 * does not apply, the hourly and daily budgets do. A batch larger than the
 * hourly or daily budget can never fit, so it is a 400 naming `field` (send
 * it in parts); one that does not fit yet is a 429 saying how many e-mails
 * are left. Nothing is recorded when it throws.
 */
export async function reserveMailBatch(ctx: Pick<AppContext, 'config' | 'sequelize'>, user: User, kind: MailSend['kind'], messages: number, field: string): Promise<void> {
  const limits = ctx.config.mailLimits
  if (!limits.enabled || messages === 0) return
  const { budget, who } = budgetOf(limits, user)
  const most = Math.min(budget.perHour, budget.perDay)
  if (messages > most) {
    throw errors.validation(
      { [field]: `This list needs ${messages} e-mails, and ${who} may have the server send at most ${most} ${most === budget.perHour ? 'an hour' : 'a day'}: send it in parts of at most ${most}` },
      'The list is longer than the e-mail limits allow at once; nothing was sent',
    )
  }
  await record(ctx, user, kind, messages, budget, who, true)
}

function budgetOf(limits: MailLimits, user: User): { budget: MailBudget; who: string } {
  const young = Date.now() - user.createdAt.getTime() < limits.newAccountDays * DAY_MS
  return { budget: young ? limits.newAccount : limits.regular, who: young ? `an account younger than ${limits.newAccountDays} day(s)` : 'an account' }
}

async function record(ctx: Pick<AppContext, 'config' | 'sequelize'>, user: User, kind: MailSend['kind'], recipients: number, budget: MailBudget, who: string, sayLeft: boolean): Promise<void> {
  await ctx.sequelize.transaction(async (transaction) => {
    await ctx.sequelize.query('SELECT pg_advisory_xact_lock(hashtext(:key))', { replacements: { key: `mail:${user.id}` }, transaction })
    const now = Date.now()
    for (const [windowMs, limit, name] of [[HOUR_MS, budget.perHour, 'hour'], [DAY_MS, budget.perDay, 'day']] as const) {
      const since = new Date(now - windowMs)
      const rows = await MailSend.findAll({ where: { userId: user.id, createdAt: { [Op.gt]: since } }, order: [['createdAt', 'ASC']], attributes: ['recipients', 'createdAt'], transaction })
      let sent = rows.reduce((n, r) => n + r.recipients, 0)
      if (sent + recipients <= limit) continue
      // Wait until enough of the window's sends have aged out to make room.
      let retryAt = now + windowMs
      for (const r of rows) {
        sent -= r.recipients
        if (sent + recipients <= limit) {
          retryAt = r.createdAt.getTime() + windowMs
          break
        }
      }
      const seconds = Math.max(1, Math.ceil((retryAt - now) / 1000))
      const used = rows.reduce((n, r) => n + r.recipients, 0)
      const left = sayLeft ? ` (${Math.max(0, limit - used)} left, ${recipients} needed)` : ''
      throw new ApiError(429, 'rate_limited', `${who[0]?.toUpperCase()}${who.slice(1)} may have the server send ${limit} e-mail(s) per ${name}${left}; nothing was sent: try again in ${Math.ceil(seconds / 60)} minute(s)`, undefined, seconds)
    }
    await MailSend.create({ userId: user.id, kind, recipients }, { transaction })
  })
}
