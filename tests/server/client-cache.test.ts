/**
 * Cache headers and compression of the built client (issue 15): hashed files
 * are kept for a year, index.html is revalidated, text is compressed.
 */
import fs from 'node:fs'
import http from 'node:http'
import type { AddressInfo } from 'node:net'
import os from 'node:os'
import path from 'node:path'
import zlib from 'node:zlib'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Runtime } from '../../server/runtime'
import { startTestServer } from './helpers'

const clientDir = fs.mkdtempSync(path.join(os.tmpdir(), 'chimeline-dist-'))
const script = `console.log(${JSON.stringify('lane '.repeat(2000))})`
fs.writeFileSync(path.join(clientDir, 'index.html'), '<!doctype html><title>Chimeline shell</title><script type="module" src="/assets/index-B3x9Qe7k.js"></script>')
fs.writeFileSync(path.join(clientDir, 'favicon.svg'), '<svg xmlns="http://www.w3.org/2000/svg"/>')
fs.mkdirSync(path.join(clientDir, 'assets'))
fs.writeFileSync(path.join(clientDir, 'assets', 'index-B3x9Qe7k.js'), script)

let runtime: Runtime
beforeAll(async () => {
  runtime = await startTestServer({ clientDir })
})
afterAll(async () => {
  await runtime.close()
  fs.rmSync(clientDir, { recursive: true, force: true })
})

/** The raw bytes of an answer (supertest and fetch would decompress them). */
async function raw(url: string, acceptEncoding: string): Promise<{ headers: http.IncomingHttpHeaders; body: Buffer }> {
  const server = http.createServer(runtime.handler)
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve))
  try {
    const { port } = server.address() as AddressInfo
    return await new Promise((resolve, reject) => {
      http.get({ host: '127.0.0.1', port, path: url, headers: { 'Accept-Encoding': acceptEncoding } }, (res) => {
        const chunks: Buffer[] = []
        res.on('data', (c: Buffer) => chunks.push(c))
        res.on('end', () => resolve({ headers: res.headers, body: Buffer.concat(chunks) }))
      }).on('error', reject)
    })
  } finally {
    server.close()
  }
}

describe('the built client over HTTP', () => {
  it('keeps hashed assets for a year without revalidation (RFC 8246 immutable, RFC 9111 max-age)', async () => {
    const res = await request(runtime.app).get('/assets/index-B3x9Qe7k.js').expect(200)
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable')
  })

  it('revalidates index.html on every load, as the page and as every client route: 304 when unchanged', async () => {
    for (const url of ['/', '/index.html', '/bench', '/s/some-share-token']) {
      const res = await request(runtime.app).get(url).expect(200)
      expect(res.headers['cache-control']).toBe('no-cache')
      expect(res.text).toContain('<title>Chimeline shell</title>')
      const again = await request(runtime.app).get(url).set('If-None-Match', res.headers.etag as string)
      expect(again.status).toBe(304)
    }
  })

  it('keeps other top-level files an hour', async () => {
    const res = await request(runtime.app).get('/favicon.svg').expect(200)
    expect(res.headers['cache-control']).toBe('public, max-age=3600')
  })

  it('compresses text for a browser that accepts it (gzip, brotli), and not for one that does not', async () => {
    const gz = await raw('/assets/index-B3x9Qe7k.js', 'gzip')
    expect(gz.headers['content-encoding']).toBe('gzip')
    expect(zlib.gunzipSync(gz.body).toString()).toBe(script)
    expect(gz.body.length).toBeLessThan(script.length / 10)
    const br = await raw('/assets/index-B3x9Qe7k.js', 'br, gzip')
    expect(br.headers['content-encoding']).toBe('br')
    expect(zlib.brotliDecompressSync(br.body).toString()).toBe(script)
    const plain = await raw('/assets/index-B3x9Qe7k.js', 'identity')
    expect(plain.headers['content-encoding']).toBeUndefined()
    expect(plain.body.toString()).toBe(script)
  })
})
