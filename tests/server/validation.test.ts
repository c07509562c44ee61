/** Every body is checked against the shared zod schemas; errors name the field. */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { JSON_BODY_LIMIT_BYTES, errorBodySchema } from '../../shared/schemas/errors'
import type { Runtime } from '../../server/runtime'
import { buildUser, buildWorkspace, startTestServer, type BuiltUser } from './helpers'

let runtime: Runtime
let owner: BuiltUser
let workspaceId: string

beforeAll(async () => {
  runtime = await startTestServer()
  owner = await buildUser(runtime)
  workspaceId = (await buildWorkspace([{ user: owner.user, role: 'owner' }])).id
})
afterAll(async () => {
  await runtime.close()
})

describe('malformed bodies', () => {
  it.each([
    ['wrong types', '/api/auth/signin', { email: 3, password: true }, { email: 'An e-mail address must be text', password: 'A password must be text' }],
    ['missing fields', '/api/auth/signup', {}, { email: 'An e-mail address is required', name: 'A name is required', password: 'A password is required' }],
    ['one missing field', '/api/auth/signup', { email: 'a@example.test', password: 'long-enough-pw' }, { name: 'A name is required' }],
    ['an address that is no address', '/api/auth/forgot', { email: 'lanes-at-example' }, { email: 'Enter a valid e-mail address' }],
    ['an empty reset token', '/api/auth/reset', { token: '', password: 'long-enough-pw' }, { token: 'A token is required' }],
    ['an array instead of an object', '/api/auth/signin', [1, 2], { body: 'Invalid input: expected object, received array' }],
  ])('answers 400 for %s, naming each field', async (_case, path, body, fields) => {
    const res = await request(runtime.app).post(path).send(body)
    expect(res.status).toBe(400)
    expect(errorBodySchema.parse(res.body).error).toEqual({ code: 'validation_failed', message: 'Some fields are not valid', fields })
  })

  it.each([
    ['an unknown role', `/invitations`, { email: 'x@example.test', role: 'superuser' }, 'role'],
    ['a blank workspace name', '', { name: '   ' }, 'name'],
    ['a workspace name of 81 characters', '', { name: 'w'.repeat(81) }, 'name'],
  ])('answers 400 for %s on workspace routes', async (_case, suffix, body, field) => {
    const method = suffix === '' ? 'patch' : 'post'
    const res = await request(runtime.app)[method](`/api/workspaces/${workspaceId}${suffix}`).set(owner.auth).send(body)
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toEqual([field])
  })

  it('answers a body that is not JSON with 400 malformed_json', async () => {
    const res = await request(runtime.app).post('/api/auth/signin').set('Content-Type', 'application/json').send('{"email": ')
    expect(res.status).toBe(400)
    expect(res.body.error).toEqual({ code: 'malformed_json', message: 'The request body is not valid JSON' })
  })

  it('answers a body over the 1 MiB limit with 413 and says what the limit is', async () => {
    const huge = { email: 'a@example.test', password: 'x'.repeat(JSON_BODY_LIMIT_BYTES) }
    const res = await request(runtime.app).post('/api/auth/signin').send(huge)
    expect(res.status).toBe(413)
    expect(res.body.error).toEqual({ code: 'payload_too_large', message: 'The request body is larger than the limit of 1 MiB' })
  })

  it('accepts a body just under the limit as far as size goes (then validates it)', async () => {
    const name = 'n'.repeat(JSON_BODY_LIMIT_BYTES - 200)
    const res = await request(runtime.app).post('/api/workspaces').set(owner.auth).send({ name })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ name: 'A workspace name has at most 80 characters' })
  })

  it('answers an unknown API route with a JSON 404', async () => {
    const res = await request(runtime.app).get('/api/no-such-thing')
    expect(res.status).toBe(404)
    expect(res.body.error).toEqual({ code: 'not_found', message: 'No such API route: GET /api/no-such-thing' })
  })

  it('sends the helmet security headers', async () => {
    const res = await request(runtime.app).get('/api/health')
    expect(res.headers['x-content-type-options']).toBe('nosniff')
    expect(res.headers['content-security-policy']).toContain("default-src 'self'")
    expect(res.headers['x-powered-by']).toBeUndefined()
  })
})
