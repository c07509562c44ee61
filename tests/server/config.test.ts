import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import { describe, expect, it } from 'vitest'
import { loadConfig, loadJwtSecret } from '../../server/config'

describe('the JWT secret', () => {
  it('is generated once into the data folder with mode 600 and reused', () => {
    const folder = fs.mkdtempSync(path.join(os.tmpdir(), 'chimeline-secret-'))
    try {
      const first = loadJwtSecret({}, folder)
      const file = path.join(folder, 'jwt-secret')
      expect(fs.statSync(file).mode & 0o777).toBe(0o600)
      expect(first.length).toBeGreaterThanOrEqual(48)
      expect(loadJwtSecret({}, folder)).toBe(first)
    } finally {
      fs.rmSync(folder, { recursive: true, force: true })
    }
  })

  it('comes from JWT_SECRET when set, which must be at least 32 characters', () => {
    expect(loadJwtSecret({ JWT_SECRET: 's'.repeat(32) }, '/nonexistent')).toBe('s'.repeat(32))
    expect(() => loadJwtSecret({ JWT_SECRET: 'short' }, '/nonexistent')).toThrow('JWT_SECRET must have at least 32 characters')
  })
})

describe('configuration from the environment', () => {
  const base = { JWT_SECRET: 'x'.repeat(32) }

  it('defaults to 127.0.0.1:3000, the private cluster and the SMTP sink', () => {
    const config = loadConfig(base)
    expect(config).toMatchObject({ host: '127.0.0.1', port: 3000, publicUrl: 'http://127.0.0.1:3000', smtpUrl: null, smtpSinkPort: 2525, seedDemo: true })
    expect(config.databaseUrl).toMatch(/^postgres:\/\/postgres@127\.0\.0\.1:\d+\/chimeline$/)
  })

  it('seeds the demo in production only when asked', () => {
    expect(loadConfig({ ...base, NODE_ENV: 'production' }).seedDemo).toBe(false)
    expect(loadConfig({ ...base, NODE_ENV: 'production', CHIMELINE_SEED_DEMO: '1' }).seedDemo).toBe(true)
  })

  it('names the variable when a number is not one', () => {
    expect(() => loadConfig({ ...base, PORT: 'eighty' })).toThrow('PORT must be a non-negative integer, got "eighty"')
  })
})
