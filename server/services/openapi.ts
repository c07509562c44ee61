/**
 * The OpenAPI 3.1 description of the API, generated from the same zod schemas
 * that validate requests (@asteasolutions/zod-to-openapi). Served at
 * GET /api/docs. Each route is listed once here with its schemas; the test
 * checks that every route the app answers is described.
 */
import * as sw from '../../shared/schemas/sweep'
import * as su from '../../shared/schemas/suite'
import { OpenAPIRegistry, OpenApiGeneratorV31 } from '@asteasolutions/zod-to-openapi'
import { z } from 'zod'
import * as auth from '../../shared/schemas/auth'
import * as classroom from '../../shared/schemas/classroom'
import { bundleSchema, exportBodySchema } from '../../shared/schemas/bundle'
import { errorBodySchema } from '../../shared/schemas/errors'
import { healthResponseSchema } from '../../shared/schemas/health'
import { outboxResponseSchema } from '../../shared/schemas/outbox'
import * as sc from '../../shared/schemas/scenario'
import * as sl from '../../shared/schemas/share-link'
import * as up from '../../shared/schemas/upload'
import * as ws from '../../shared/schemas/workspace'
import { appVersion } from '../version'

type Method = 'get' | 'post' | 'patch' | 'delete'

export interface DocumentedRoute {
  method: Method
  /** Express form, e.g. /api/workspaces/:id */
  path: string
  summary: string
  /** Who may call it. */
  access: string
  body?: z.ZodType
  multipart?: boolean
  query?: z.ZodObject
  ok: number
  response?: z.ZodType
  errors?: { status: number; description: string; schema?: z.ZodType }[]
}

const id = z.uuid()
const empty = undefined

/** Every route of the API. */
export const DOCUMENTED_ROUTES: DocumentedRoute[] = [
  { method: 'get', path: '/api/health', summary: 'Version and database state', access: 'anyone', ok: 200, response: healthResponseSchema },
  { method: 'post', path: '/api/auth/signup', summary: 'Create an account; sets the refresh cookie', access: 'anyone (rate limited)', body: auth.signUpBodySchema, ok: 201, response: auth.authResponseSchema },
  { method: 'post', path: '/api/auth/signin', summary: 'Sign in; sets the refresh cookie', access: 'anyone (rate limited)', body: auth.signInBodySchema, ok: 200, response: auth.authResponseSchema },
  { method: 'post', path: '/api/auth/refresh', summary: 'New access token from the refresh cookie (rotated); `{ user: null }` without any cookie; 401 for a cookie that is unknown, expired or reused', access: 'refresh cookie', ok: 200, response: auth.refreshResponseSchema },
  { method: 'post', path: '/api/auth/signout', summary: 'End the session', access: 'anyone', ok: 204 },
  { method: 'post', path: '/api/auth/forgot', summary: 'E-mail a reset link (always 202)', access: 'anyone (rate limited)', body: auth.forgotBodySchema, ok: 202 },
  { method: 'post', path: '/api/auth/reset', summary: 'Set a new password with a reset token', access: 'anyone (rate limited)', body: auth.resetBodySchema, ok: 200, response: auth.authResponseSchema },
  { method: 'get', path: '/api/me', summary: 'The signed-in user and their workspaces', access: 'signed in', ok: 200, response: ws.meResponseSchema },
  { method: 'get', path: '/api/workspaces', summary: 'My workspaces', access: 'signed in', ok: 200, response: ws.workspaceListResponseSchema },
  { method: 'post', path: '/api/workspaces', summary: 'Create a workspace (creator becomes owner)', access: 'signed in', body: ws.workspaceBodySchema, ok: 201, response: ws.workspaceResponseSchema },
  { method: 'get', path: '/api/workspaces/:id', summary: 'One workspace', access: 'member', ok: 200, response: ws.workspaceResponseSchema },
  { method: 'patch', path: '/api/workspaces/:id', summary: 'Rename, or set the default preset of imports', access: 'owner', body: ws.workspacePatchSchema, ok: 200, response: ws.workspaceResponseSchema },
  { method: 'delete', path: '/api/workspaces/:id', summary: 'Soft delete (undo within 30 days)', access: 'owner', ok: 204 },
  { method: 'post', path: '/api/workspaces/:id/undo-delete', summary: 'Bring a deleted workspace back within 30 days (410 undo_expired after)', access: 'owner', ok: 200, response: ws.workspaceResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/members', summary: 'Members and pending invitations', access: 'member', ok: 200, response: ws.membersResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/invitations', summary: 'Invite by e-mail', access: 'owner', body: ws.invitationBodySchema, ok: 201, response: ws.invitationResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/invitations/bulk', summary: 'Invite a class from a pasted list of addresses', access: 'owner', body: classroom.bulkInvitationBodySchema, ok: 201, response: classroom.bulkInvitationResultSchema },
  { method: 'patch', path: '/api/workspaces/:id/members/:userId', summary: 'Change a role', access: 'owner', body: ws.memberRoleBodySchema, ok: 200, response: ws.memberResponseSchema },
  { method: 'delete', path: '/api/workspaces/:id/members/:userId', summary: 'Remove a member, or leave', access: 'owner, or the member themselves', ok: 204 },
  { method: 'post', path: '/api/invitations/accept', summary: 'Accept an invitation token', access: 'signed in', body: ws.acceptInvitationBodySchema, ok: 200, response: ws.workspaceResponseSchema },
  { method: 'get', path: '/api/admin/outbox', summary: 'Messages the local SMTP sink received', access: 'site admin', ok: 200, response: outboxResponseSchema },

  { method: 'get', path: '/api/workspaces/:id/sweeps', summary: "The workspace's sweeps, newest first (200 at most), with points done; ?scenarioId= one scenario's, with their version numbers", access: 'member', ok: 200, response: sw.sweepListResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/sweeps', summary: 'Save a browser sweep with its points, or queue a server sweep for the workers (429 past the workspace limits)', access: 'owner, editor', body: sw.createSweepBodySchema, ok: 201, response: sw.sweepCreatedResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/sweeps/:sweepId', summary: 'One sweep: definition, progress and the points done (poll while it runs)', access: 'member', ok: 200, response: sw.sweepResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/sweeps/:sweepId/cancel', summary: 'Cancel a queued or running server sweep; the points done are kept', access: 'owner, editor', ok: 200, response: sw.sweepCreatedResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/suites', summary: "The workspace's suites with their scenarios, watchers and last run", access: 'member', ok: 200, response: su.suiteListResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/suites', summary: 'Create a suite: scenarios of the workspace, an optional preset, watchers among its members', access: 'owner, editor', body: su.suiteBodySchema, ok: 201, response: su.suiteResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/suites/:suiteId', summary: 'One suite', access: 'member', ok: 200, response: su.suiteResponseSchema },
  { method: 'patch', path: '/api/workspaces/:id/suites/:suiteId', summary: "Replace a suite's title, scenarios, preset and watchers (the whole body)", access: 'owner, editor', body: su.suiteBodySchema, ok: 200, response: su.suiteResponseSchema },
  { method: 'delete', path: '/api/workspaces/:id/suites/:suiteId', summary: 'Delete a suite and its run history (its scenarios stay)', access: 'owner, editor', ok: 204 },
  { method: 'get', path: '/api/workspaces/:id/suites/:suiteId/export', summary: "The suite's scenarios as a bundle with the suite's title and preset, for `chimeline check`", access: 'member', ok: 200, response: bundleSchema },
  { method: 'post', path: '/api/workspaces/:id/suites/:suiteId/runs', summary: 'Queue a run of the suite for the workers, optionally on another preset (429 past the workspace limits)', access: 'owner, editor', body: su.suiteRunBodySchema, ok: 201, response: su.suiteRunCreatedResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/suites/:suiteId/runs', summary: "The suite's run history, newest first, with each run's model version", access: 'member', ok: 200, response: su.suiteRunListResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/suites/:suiteId/runs/:runId', summary: 'One run: per scenario the version that ran, each expectation\'s verdict and the characterisation figures', access: 'member', ok: 200, response: su.suiteRunResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/scenarios', summary: 'List scenarios: pagination, sorting, filters by tag, author and text; trash=true lists deleted ones', access: 'member', query: sc.scenarioListQuerySchema, ok: 200, response: sc.scenarioListResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/scenarios', summary: 'Create a scenario (version 1)', access: 'owner, editor', body: sc.createScenarioBodySchema, ok: 201, response: sc.scenarioResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/scenarios/export', summary: 'Export scenarios with their history as one bundle', access: 'member', body: exportBodySchema, ok: 200, response: bundleSchema },
  { method: 'post', path: '/api/workspaces/:id/scenarios/copy-from-share', summary: 'Copy a shared scenario into this workspace', access: 'owner, editor', body: sl.copyShareBodySchema, ok: 201, response: sc.scenarioResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/scenarios/:scenarioId', summary: 'One scenario (newest content)', access: 'member', ok: 200, response: sc.scenarioResponseSchema },
  { method: 'delete', path: '/api/workspaces/:id/scenarios/:scenarioId', summary: 'Soft delete (undo within 30 days)', access: 'owner', ok: 200, response: sc.scenarioResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/scenarios/:scenarioId/undo-delete', summary: 'Bring a deleted scenario back (410 undo_expired after 30 days)', access: 'owner', ok: 200, response: sc.scenarioResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/scenarios/:scenarioId/duplicate', summary: 'Duplicate as a new scenario', access: 'owner, editor', body: sc.duplicateScenarioBodySchema, ok: 201, response: sc.scenarioResponseSchema },
  {
    method: 'post', path: '/api/workspaces/:id/scenarios/:scenarioId/versions', summary: 'Save a new version; baseVersion is the version the edit started from', access: 'owner, editor', body: sc.saveScenarioBodySchema, ok: 201, response: sc.savedScenarioResponseSchema,
    errors: [{ status: 409, description: 'Someone saved in between: their version and yours', schema: sc.saveConflictBodySchema }],
  },
  { method: 'get', path: '/api/workspaces/:id/scenarios/:scenarioId/versions', summary: 'History, newest first', access: 'member', ok: 200, response: sc.versionListResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/scenarios/:scenarioId/versions/diff', summary: 'Diff two versions: program lines, machine fields, metrics', access: 'member', query: sc.versionDiffQuerySchema, ok: 200, response: sc.versionDiffResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/scenarios/:scenarioId/versions/:number', summary: 'One version', access: 'member', ok: 200, response: sc.versionResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/scenarios/:scenarioId/versions/:number/restore', summary: 'A new version with an old version\'s content', access: 'owner, editor', body: sc.restoreVersionBodySchema, ok: 201, response: sc.savedScenarioResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/scenarios/:scenarioId/share-links', summary: 'Make a share link; the token is in this answer only', access: 'owner, editor', body: sl.createShareLinkBodySchema, ok: 201, response: sl.createShareLinkResponseSchema },
  { method: 'get', path: '/api/workspaces/:id/scenarios/:scenarioId/share-links', summary: 'The scenario\'s share links', access: 'owner, editor', ok: 200, response: sl.shareLinkListResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/share-links/:linkId/revoke', summary: 'Revoke a link', access: 'owner; editor for their own links', ok: 200, response: sl.shareLinkResponseSchema },
  { method: 'post', path: '/api/workspaces/:id/share-links/:linkId/email', summary: 'E-mail a link with a note', access: 'owner, editor', body: sl.emailShareLinkBodySchema, ok: 202, response: sl.emailShareLinkResponseSchema },
  {
    method: 'get', path: '/api/shares/:token', summary: 'Open a share link (Bearer token optional; required for workspace-only links)', access: 'anyone with the link', ok: 200, response: sl.sharedScenarioResponseSchema,
    errors: [{ status: 404, description: 'No such link' }, { status: 410, description: 'share_expired or share_revoked' }],
  },
  { method: 'post', path: '/api/workspaces/:id/uploads/inspect', summary: 'What a file holds (ELF: its functions); stores nothing', access: 'owner, editor', multipart: true, ok: 200, response: up.uploadInspectionSchema, errors: [{ status: 400, description: 'The file cannot be read; diagnostics say where', schema: up.uploadErrorBodySchema }, { status: 413, description: 'Over the size limit' }] },
  { method: 'post', path: '/api/workspaces/:id/uploads', summary: 'Import a .s, objdump -d listing, ELF function or bundle (all or nothing)', access: 'owner, editor', multipart: true, ok: 201, response: up.uploadResponseSchema, errors: [{ status: 400, description: 'The file cannot be read; diagnostics say where', schema: up.uploadErrorBodySchema }, { status: 413, description: 'Over the size limit' }] },
  { method: 'get', path: '/api/docs', summary: 'This description', access: 'anyone', ok: 200 },
]

const toOpenApiPath = (p: string) => p.replace(/:([A-Za-z]+)/g, '{$1}')

let cached: object | null = null

export function openApiDocument(): object {
  if (cached) return cached
  const registry = new OpenAPIRegistry()
  registry.registerComponent('securitySchemes', 'bearer', { type: 'http', scheme: 'bearer', bearerFormat: 'JWT' })
  for (const r of DOCUMENTED_ROUTES) {
    const names = [...r.path.matchAll(/:([A-Za-z]+)/g)].map((m) => m[1] as string)
    const params = names.length ? z.object(Object.fromEntries(names.map((n) => [n, n === 'id' || n.endsWith('Id') ? id : z.string()]))) : empty
    const multipart = z.object({ file: z.string().meta({ format: 'binary' }), kind: z.enum(up.UPLOAD_KINDS).optional(), function: z.string().optional(), title: z.string().optional() })
    registry.registerPath({
      method: r.method,
      path: toOpenApiPath(r.path),
      summary: r.summary,
      description: `Access: ${r.access}.`,
      security: r.access.startsWith('anyone') ? [] : [{ bearer: [] }],
      request: {
        ...(params ? { params } : {}),
        ...(r.query ? { query: r.query } : {}),
        ...(r.body ? { body: { content: { 'application/json': { schema: r.body } } } } : {}),
        ...(r.multipart ? { body: { content: { 'multipart/form-data': { schema: multipart } } } } : {}),
      },
      responses: {
        [r.ok]: { description: 'Success', ...(r.response ? { content: { 'application/json': { schema: r.response } } } : {}) },
        ...Object.fromEntries((r.errors ?? []).map((e) => [e.status, { description: e.description, content: { 'application/json': { schema: e.schema ?? errorBodySchema } } }])),
        default: { description: 'An error: { error: { code, message, fields? } }', content: { 'application/json': { schema: errorBodySchema } } },
      },
    })
  }
  cached = new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: '3.1.0',
    info: { title: 'Chimeline API', version: appVersion, description: 'Scenarios, versions, share links, uploads, workspaces and sign-in. Results are model estimates.' },
    servers: [{ url: '/' }],
  })
  return cached
}
