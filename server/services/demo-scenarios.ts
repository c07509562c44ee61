/**
 * The demo workspace's scenarios: every shipped example (examples/*.s) with
 * two or three versions that change one machine field each, tags, a Markdown
 * description made from the example's header comment, and one `anyone` share
 * link whose URL `npm start` prints. Idempotent: an example whose title is
 * already in the workspace (even in its trash) is left alone, and the share
 * link's token is derived from the server's secret, so every start prints the
 * same working URL without storing the token.
 */
import crypto from 'node:crypto'
import fs from 'node:fs'
import path from 'node:path'
import { exampleList, type Example } from '../../shared/examples'
import type { MachineInput } from '../../shared/schemas/machine'
import { scenarioContentSchema, type ScenarioContent } from '../../shared/schemas/scenario'
import { hashToken } from '../auth/tokens'
import type { AppContext } from '../context'
import { projectRoot } from '../db/cluster'
import { Scenario, ScenarioVersion, ShareLink, type User, type Workspace } from '../models'
import { createScenario, saveScenario } from './scenarios'
import { shareUrl } from './share-links'

interface DemoVariant {
  /** The version's message: what changed and what to look for. */
  message: string
  machine: MachineInput
}

interface DemoPlan {
  tags: string[]
  /** Versions after the first, which runs on the default machine. */
  variants: DemoVariant[]
}

/** Our own teaching variations of each example; unknown examples get one version. */
const PLANS: Record<string, DemoPlan> = {
  saxpy: {
    tags: ['fp32', 'ragged tail', 'strip-mining'],
    variants: [
      { message: '4 lanes: the 19 elements split 5, 5, 5, 4', machine: { lanes: 4 } },
      { message: 'Serial issue: each instruction waits for the one before to finish on every lane', machine: { issue: 'serial' } },
    ],
  },
  dot: {
    tags: ['fp64', 'reduction'],
    variants: [
      { message: 'One reduction accumulator per lane', machine: { reductionAccumulators: 1 } },
      { message: 'Lane partials combined by a tree instead of the ring', machine: { interLane: 'tree' } },
    ],
  },
  stencil: {
    tags: ['fp64', 'slides', 'ring'],
    variants: [{ message: 'Bidirectional ring: a slide down no longer goes the long way round', machine: { ringBidirectional: true } }],
  },
  clamp: {
    tags: ['int32', 'masks'],
    variants: [{ message: '4 lanes: 5 samples a lane', machine: { lanes: 4 } }],
  },
  stripmine: {
    tags: ['int64', 'strip-mining', 'ragged tail'],
    variants: [
      { message: '16 lanes: the 44-element strip leaves 4 lanes with one element less', machine: { lanes: 16 } },
      { message: 'Two memory ports on the same shared buses', machine: { memoryPorts: 2 } },
    ],
  },
  reduction: {
    tags: ['fp32', 'reduction', 'ordered'],
    variants: [
      { message: 'One reduction accumulator per lane', machine: { reductionAccumulators: 1 } },
      { message: 'Ring hops of 2 cycles: the ordered sum pays on every element', machine: { ringHopLatency: 2 } },
    ],
  },
  'bank-conflicts': {
    tags: ['fp64', 'register file', 'bank conflicts'],
    variants: [
      { message: '4 banks per lane: more collisions', machine: { rfBanks: 4 } },
      { message: '8 banks of 2 ports per lane: no collisions left', machine: { rfBanks: 8, rfPortsPerBank: 2 } },
    ],
  },
  'compiled-daxpy': {
    tags: ['fp64', 'compiler output', 'strip-mining'],
    variants: [{ message: '4 lanes: the same compiled loop on half the lanes', machine: { lanes: 4 } }],
  },
  'compiled-fir': {
    tags: ['int16', 'compiler output', 'fixed point'],
    variants: [{ message: 'Serial issue: the widening multiply-adds no longer overlap', machine: { issue: 'serial' } }],
  },
  'long-stream': {
    tags: ['fp64', 'throughput'],
    variants: [
      { message: 'Serial issue', machine: { issue: 'serial' } },
      { message: '8 banks per lane', machine: { rfBanks: 8 } },
    ],
  },
}

/** The header comment as Markdown: the first clause in bold, the rest as a paragraph, then the versions. */
export function demoDescription(example: Example, plan: DemoPlan | undefined): string {
  const header: string[] = []
  for (const line of example.source.split('\n')) {
    const m = /^#\s?(.*)$/.exec(line)
    if (!m) break
    header.push(m[1] ?? '')
  }
  const text = header.join(' ').replace(/\s+/g, ' ').trim()
  const rest = text.startsWith(example.title) ? text.slice(example.title.length).replace(/^[:.]\s*/, '') : text
  const versions = ['1. the default machine', ...(plan?.variants ?? []).map((v, i) => `${i + 2}. ${v.message}`)]
  return `**${example.title}.** ${rest}\n\n**Versions**\n\n${versions.join('\n')}\n\n_Results are model estimates, not sign-off for silicon._`
}

function readExamples(): Example[] {
  const dir = path.join(projectRoot, 'examples')
  const files = Object.fromEntries(
    fs
      .readdirSync(dir)
      .filter((f) => f.endsWith('.s'))
      .map((f) => [`/examples/${f}`, fs.readFileSync(path.join(dir, f), 'utf8')]),
  )
  return exampleList(files)
}

/** The demo share link's token: stable per installation (derived from the JWT secret), never stored. */
export function demoShareToken(secret: string): string {
  return crypto.createHmac('sha256', secret).update('chimeline demo share link v1').digest('base64url')
}

export interface DemoScenariosResult {
  created: number
  /** The `anyone` link of the first example, for `npm start` to print. */
  shareUrl: string | null
}

export async function seedDemoScenarios(ctx: AppContext, workspace: Workspace, author: User): Promise<DemoScenariosResult> {
  const existing = new Set((await Scenario.findAll({ where: { workspaceId: workspace.id }, paranoid: false, attributes: ['title'] })).map((s) => s.title))
  let created = 0
  let first: Scenario | null = null
  for (const example of readExamples()) {
    const plan = PLANS[example.id]
    const base: ScenarioContent = scenarioContentSchema.parse({
      title: example.title,
      description: demoDescription(example, plan),
      tags: ['demo', ...(plan?.tags ?? [])],
      program: example.source,
    })
    if (existing.has(base.title)) continue
    let scenario = await createScenario(ctx, author, workspace.id, { content: base, message: 'The example on the default machine' })
    for (const variant of plan?.variants ?? []) {
      const content = scenarioContentSchema.parse({ ...base, machine: variant.machine })
      scenario = (await saveScenario(ctx, author, workspace.id, scenario.id, { content, baseVersion: scenario.version, message: variant.message })).scenario
    }
    created++
    first ??= scenario
  }
  return { created, shareUrl: await ensureDemoShareLink(ctx, workspace, author, first) }
}

/** The one `anyone` link: made on the first demo scenario once; later starts find it by its token's hash. */
async function ensureDemoShareLink(ctx: AppContext, workspace: Workspace, author: User, made: Scenario | null): Promise<string | null> {
  const token = demoShareToken(ctx.config.jwtSecret)
  const tokenHash = hashToken(token)
  const link = await ShareLink.findOne({ where: { tokenHash } })
  if (link) return link.revokedAt ? null : shareUrl(ctx, token)
  const scenario = made ?? (await Scenario.findOne({ where: { workspaceId: workspace.id }, order: [['createdAt', 'ASC']] }))
  if (!scenario) return null
  const version = await ScenarioVersion.findOne({ where: { scenarioId: scenario.id, number: 1 } })
  if (!version) return null
  await ShareLink.create({ scenarioId: scenario.id, versionId: version.id, view: scenario.view, tokenHash, accessMode: 'anyone', expiresAt: null, createdById: author.id })
  return shareUrl(ctx, token)
}
