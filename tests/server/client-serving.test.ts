import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Runtime } from '../../server/runtime'
import { startTestServer } from './helpers'

/** A stand-in for dist/: the server must serve whatever vite build left there. */
const clientDir = fs.mkdtempSync(path.join(os.tmpdir(), 'chimeline-dist-'))
fs.writeFileSync(path.join(clientDir, 'index.html'), '<!doctype html><title>Chimeline shell</title>')
fs.mkdirSync(path.join(clientDir, 'assets'))
fs.writeFileSync(path.join(clientDir, 'assets', 'app.js'), 'console.log("app")')

let runtime: Runtime
beforeAll(async () => {
  runtime = await startTestServer({ clientDir })
})
afterAll(async () => {
  await runtime.close()
  fs.rmSync(clientDir, { recursive: true, force: true })
})

describe('serving the built client on the API port', () => {
  it('serves static assets', async () => {
    const res = await request(runtime.app).get('/assets/app.js')
    expect(res.status).toBe(200)
    expect(res.text).toBe('console.log("app")')
  })

  it.each(['/', '/bench', '/reset?token=abc', '/workspaces/1/settings'])('answers the client route %s with index.html (history fallback)', async (url) => {
    const res = await request(runtime.app).get(url)
    expect(res.status).toBe(200)
    expect(res.text).toContain('<title>Chimeline shell</title>')
  })

  it('serves a build that appears after the app was created (the first npm start builds the client late)', async () => {
    const late = fs.mkdtempSync(path.join(os.tmpdir(), 'chimeline-late-dist-'))
    const second = await startTestServer({ clientDir: late }, runtime)
    try {
      const before = await request(second.app).get('/bench')
      expect(before.status).toBe(503)
      expect(before.text).toMatch(/not built yet/)
      fs.writeFileSync(path.join(late, 'index.html'), '<!doctype html><title>Late shell</title>')
      const after = await request(second.app).get('/bench')
      expect(after.status).toBe(200)
      expect(after.text).toContain('<title>Late shell</title>')
    } finally {
      await second.close()
      fs.rmSync(late, { recursive: true, force: true })
    }
  })

  it('keeps unknown API routes as JSON 404s', async () => {
    const res = await request(runtime.app).get('/api/bench')
    expect(res.status).toBe(404)
    expect(res.body.error.code).toBe('not_found')
  })
})
