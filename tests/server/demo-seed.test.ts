/**
 * The demo a newcomer meets: every shipped example as a scenario with versions,
 * tags and a Markdown description, and one `anyone` share link that opens
 * signed out. Seeding twice changes nothing.
 */
import fs from 'node:fs'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Scenario, ScenarioVersion, ShareLink, Suite, Workspace } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { demoShareToken } from '../../server/services/demo-scenarios'
import { DEMO_WORKSPACE, seedDemoWithScenarios } from '../../server/services/demo-seed'
import { KERNELS, KERNEL_SUITE_TITLE } from '../../server/services/demo-kernels'
import { hashToken } from '../../server/auth/tokens'
import { startTestServer } from './helpers'

let runtime: Runtime
beforeAll(async () => {
  runtime = await startTestServer()
})
afterAll(async () => {
  await runtime.close()
})

const exampleCount = fs.readdirSync(new URL('../../examples/', import.meta.url)).filter((f) => f.endsWith('.s')).length

describe('the demo seed', () => {
  it('makes one scenario per shipped example, each with 2 or 3 versions (unless one is already there), tags and a Markdown description; seeding again adds nothing', async () => {
    const first = await seedDemoWithScenarios(runtime.ctx)
    const workspace = await Workspace.findOne({ where: { name: DEMO_WORKSPACE } })
    expect(workspace).not.toBeNull()
    const scenarios = await Scenario.findAll({ where: { workspaceId: workspace!.id }, paranoid: false })
    expect(scenarios.length).toBeGreaterThanOrEqual(exampleCount)
    const saxpy = scenarios.find((s) => s.title === 'saxpy with a ragged tail')
    expect(saxpy).toBeDefined()
    expect(saxpy!.tags).toEqual(expect.arrayContaining(['demo', 'ragged tail']))
    expect(saxpy!.description).toMatch(/^\*\*saxpy with a ragged tail\.\*\* /)
    for (const s of scenarios.filter((x) => x.tags.includes('demo'))) {
      const versions = await ScenarioVersion.count({ where: { scenarioId: s.id } })
      expect(versions, s.title).toBeGreaterThanOrEqual(2)
      expect(versions, s.title).toBeLessThanOrEqual(3)
      expect(s.run.status, s.title).toBe('ok')
    }

    const again = await seedDemoWithScenarios(runtime.ctx)
    expect(again.created).toBe(0)
    expect(again.shareUrl).toBe(first.shareUrl)
    expect(await Scenario.count({ where: { workspaceId: workspace!.id }, paranoid: false })).toBe(scenarios.length)
    // The kernel suite (server/services/demo-kernels.ts): one scenario per kernel, made once.
    const suites = await Suite.findAll({ where: { workspaceId: workspace!.id, title: KERNEL_SUITE_TITLE } })
    expect(suites).toHaveLength(1)
    expect(suites[0]?.scenarioIds).toHaveLength(KERNELS.length)
    expect(scenarios.filter((s) => s.tags.includes('kernel')).map((s) => s.title).sort()).toEqual(KERNELS.map((k) => k.title).sort())
  })

  it('keeps one anyone share link whose printed URL opens without signing in', async () => {
    const { shareUrl } = await seedDemoWithScenarios(runtime.ctx)
    const token = demoShareToken(runtime.ctx.config.jwtSecret)
    expect(shareUrl).toBe(`${runtime.ctx.config.publicUrl}/s/${token}`)
    expect(await ShareLink.count({ where: { tokenHash: hashToken(token) } })).toBe(1)
    const res = await request(runtime.app).get(`/api/shares/${token}`)
    expect(res.status).toBe(200)
    expect(res.body.scenario?.content?.title ?? JSON.stringify(res.body)).toContain('saxpy')
  })
})
