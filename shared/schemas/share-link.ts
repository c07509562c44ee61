/**
 * Share links: a read-only link to one scenario version and one view. The
 * token (256 random bits, base64url) is shown once, when the link is made;
 * the server keeps only its SHA-256 hash.
 */
import { z } from 'zod'
import { sharedSweepSchema } from './sweep'
import { emailSchema } from './user'
import { personSchema, scenarioContentSchema, scenarioViewSchema, runSummarySchema } from './scenario'

export const SHARE_ACCESS_MODES = ['anyone', 'workspace'] as const
export type ShareAccessMode = (typeof SHARE_ACCESS_MODES)[number]
export const SHARE_EMAIL_MAX_RECIPIENTS = 20
export const SHARE_NOTE_MAX_LENGTH = 2000
/** Longest lifetime a link may be given; no expiry at all is allowed too. */
export const SHARE_MAX_DAYS = 3650

/** POST /api/workspaces/:id/scenarios/:scenarioId/share-links -> 201 { link, token, url } */
export const createShareLinkBodySchema = z
  .object({
    /** The version to share; default: the newest. */
    version: z.number().int().min(1).optional(),
    /** The view the reader lands on; default: the version's own view. */
    view: scenarioViewSchema.optional(),
    accessMode: z.enum(SHARE_ACCESS_MODES, { error: 'accessMode is anyone or workspace' }).default('anyone'),
    /** A finished sweep of this scenario to show beside the version (default version: the sweep's own). */
    sweepId: z.uuid({ error: 'sweepId is a sweep id (a UUID)' }).nullish(),
    /** Absolute expiry time; null or absent: never expires. */
    expiresAt: z.iso.datetime({ error: 'expiresAt is an ISO 8601 time, e.g. 2027-01-31T12:00:00Z' }).nullable().default(null)
      .refine((v) => v === null || Date.parse(v) > Date.now(), 'expiresAt must be in the future')
      .refine((v) => v === null || Date.parse(v) <= Date.now() + SHARE_MAX_DAYS * 86_400_000, `expiresAt is at most ${SHARE_MAX_DAYS} days away`),
  })
  .strict()
export type CreateShareLinkBody = z.output<typeof createShareLinkBodySchema>

export const shareLinkStatusSchema = z.enum(['active', 'expired', 'revoked'])

/** A link as its workspace sees it (never with the token). */
export const shareLinkSchema = z.object({
  id: z.uuid(),
  scenarioId: z.uuid(),
  version: z.number().int(),
  view: scenarioViewSchema,
  /** The sweep the link shows beside the version, or null. */
  sweepId: z.uuid().nullable(),
  accessMode: z.enum(SHARE_ACCESS_MODES),
  status: shareLinkStatusSchema,
  expiresAt: z.iso.datetime().nullable(),
  revokedAt: z.iso.datetime().nullable(),
  createdBy: personSchema,
  createdAt: z.iso.datetime(),
  lastOpenedAt: z.iso.datetime().nullable(),
  openCount: z.number().int(),
})
export type ShareLink = z.infer<typeof shareLinkSchema>

export const createShareLinkResponseSchema = z.object({
  link: shareLinkSchema,
  /** Shown this once; only its hash is stored. */
  token: z.string(),
  /** The reader's address: PUBLIC_URL/s/<token>. */
  url: z.string(),
})
export const shareLinkListResponseSchema = z.object({ links: z.array(shareLinkSchema) })
export const shareLinkResponseSchema = z.object({ link: shareLinkSchema })

/** Share tokens as the URL carries them; anything else is simply not found. */
export const shareTokenSchema = z.string().min(1).max(200)

/** POST /api/workspaces/:id/share-links/:linkId/email -> 202 { sent } (the token proves the sender has the link). */
export const emailShareLinkBodySchema = z
  .object({
    token: shareTokenSchema,
    to: z.array(emailSchema).min(1, 'Give at least one address').max(SHARE_EMAIL_MAX_RECIPIENTS, `At most ${SHARE_EMAIL_MAX_RECIPIENTS} addresses`),
    note: z.string().trim().max(SHARE_NOTE_MAX_LENGTH, `A note has at most ${SHARE_NOTE_MAX_LENGTH} characters`).default(''),
  })
  .strict()
export type EmailShareLinkBody = z.output<typeof emailShareLinkBodySchema>
export const emailShareLinkResponseSchema = z.object({ sent: z.array(z.string()) })

/**
 * GET /api/shares/:token: what a reader sees, without signing in when the link
 * allows it. It names no user, workspace or scenario id: the readers of an
 * `anyone` link are outside the workspace, and the answer is the same for all.
 */
export const sharedScenarioSchema = z.object({
  workspace: z.object({ name: z.string() }),
  version: z.number().int(),
  message: z.string(),
  author: personSchema.pick({ name: true }),
  savedAt: z.iso.datetime(),
  content: scenarioContentSchema,
  run: runSummarySchema,
  /** The view the link was made with (it wins over the version's own). */
  view: scenarioViewSchema,
  accessMode: z.enum(SHARE_ACCESS_MODES),
  expiresAt: z.iso.datetime().nullable(),
  /** The sweep the link points at (its plot and table, read-only), or null. */
  sweep: sharedSweepSchema.nullable().default(null),
})
export type SharedScenario = z.infer<typeof sharedScenarioSchema>
export const sharedScenarioResponseSchema = z.object({ share: sharedScenarioSchema })

/** POST /api/workspaces/:id/scenarios/copy-from-share { token } -> 201 { scenario } */
export const copyShareBodySchema = z.object({ token: shareTokenSchema, title: z.string().trim().min(1).max(200).optional() }).strict()
