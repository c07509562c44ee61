import fs from 'node:fs'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { healthResponseSchema } from '../../shared/schemas/health'
import { openConnection } from '../../server/db/connection'
import type { Runtime } from '../../server/runtime'
import { startTestServer } from './helpers'

const version = (JSON.parse(fs.readFileSync('package.json', 'utf8')) as { version: string }).version

let runtime: Runtime
beforeAll(async () => {
  runtime = await startTestServer()
})
afterAll(async () => {
  await runtime.close()
})

describe('GET /api/health', () => {
  it('says ok, gives the version from package.json and that the database answers', async () => {
    const res = await request(runtime.app).get('/api/health')
    expect(res.status).toBe(200)
    expect(healthResponseSchema.parse(res.body)).toEqual({ status: 'ok', version, database: 'up' })
  })

  it('says degraded with 503 when the database does not answer', async () => {
    // Port 1 on loopback: nothing listens there, so the probe fails for real.
    const unreachable = openConnection('postgres://postgres@127.0.0.1:1/chimeline_test')
    const down = await startTestServer({}, { ...runtime, ctx: { ...runtime.ctx, sequelize: unreachable } })
    try {
      const res = await request(down.app).get('/api/health')
      expect(res.status).toBe(503)
      expect(res.body).toEqual({ status: 'degraded', version, database: 'down' })
    } finally {
      await down.close()
      await unreachable.close()
    }
  })
})
