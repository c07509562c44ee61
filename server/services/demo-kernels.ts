/**
 * The demo workspace's kernel suite: one scenario per kernel of our own
 * (examples/kernels/*.s, plus the strip-mined loop and the two compiled
 * kernels of examples/), each with expectations that hold on the default
 * machine, and the suite "Kernels" that runs them. Every value below is
 * derived by hand from the program and the default machine (8 lanes, VLEN
 * 8192, FPU latency 4, one 512-bit load bus and one store bus, one element a
 * cycle for indexed accesses, ring hops of 1 cycle) or is a bound of common
 * practice (no kernel beats its bus or its peak); none was read off a run.
 * Idempotent like the demo scenarios: a kernel whose title exists is left
 * alone, and the suite is made once.
 */
import fs from 'node:fs'
import path from 'node:path'
import type { Expectation } from '../../shared/schemas/expectation'
import { scenarioContentSchema, type ScenarioContent } from '../../shared/schemas/scenario'
import type { AppContext } from '../context'
import { projectRoot } from '../db/cluster'
import { Scenario, Suite, type User, type Workspace } from '../models'
import { createScenario } from './scenarios'

export const KERNEL_SUITE_TITLE = 'Kernels'

const m = (metric: string, op: string, value: number) => ({ kind: 'metric', metric, op, value }) as Expectation
const mem = (label: string, type: string, values: string[]) => ({ kind: 'memory', label, type, values }) as Expectation

export interface Kernel {
  title: string
  /** Under examples/. */
  file: string
  tags: string[]
  expectations: Expectation[]
}

export const KERNELS: readonly Kernel[] = [
  {
    title: 'Kernel: axpy',
    file: 'kernels/axpy.s',
    tags: ['fp64', 'streaming'],
    expectations: [
      m('flops', '==', 2048), // 1024 FMAs of 2 flops
      m('cycles', '>=', 256), // 16 KiB of loads over a 64-byte-a-cycle load bus
      m('fractionOfPeak', '<=', 0.5), // the loads feed at most 4 elements a cycle: 8 of the 16 peak flops a cycle
    ],
  },
  {
    title: 'Kernel: dot product',
    file: 'kernels/dot.s',
    tags: ['fp64', 'reduction'],
    expectations: [
      m('flops', '==', 2176), // 1024 FMAs of 2 flops, and the final vfredusum adds its 128 elements: 2048 + 128
      m('cycles', '>=', 256), // 16 KiB of loads over the 64-byte load bus
      m('fractionOfPeak', '<=', 0.5), // as axpy: the loads cap it at half the peak
    ],
  },
  {
    title: 'Kernel: matrix-vector',
    file: 'kernels/matvec.s',
    tags: ['fp64', 'blas-2'],
    expectations: [
      m('flops', '==', 8192), // 64 x 64 FMAs of 2 flops
      m('cycles', '>=', 512), // A is 32 KiB: 512 cycles of the load bus to read it (and as many of the store bus to fill it)
      mem('y', 'f64', ['64', '64', '64', '64', '64', '64', '64', '64']), // A and x all ones: each y[i] is 64 ones added
    ],
  },
  {
    title: 'Kernel: 3-point stencil',
    file: 'kernels/stencil.s',
    tags: ['fp64', 'stencil'],
    expectations: [
      m('flops', '==', 4088), // 1022 points x (an add, a multiply and an FMA of 2) = 1022 x 4
      m('cycles', '>=', 384), // 3 loads of 8 bytes a point: 1022 x 24 / 64 = 383.3 cycles of the load bus
      m('fractionOfPeak', '<=', 0.67), // 24 bytes a point at 64 a cycle: 2.67 points x 4 flops = 10.7 of the 16 peak flops a cycle
    ],
  },
  {
    title: 'Kernel: unordered reduction',
    file: 'kernels/reduce-unordered.s',
    tags: ['fp32', 'reduction'],
    expectations: [
      m('flops', '==', 256), // one add per element
      mem('sum', 'f32', ['256']), // 256 ones: exact in any order
    ],
  },
  {
    title: 'Kernel: ordered reduction',
    file: 'kernels/reduce-ordered.s',
    tags: ['fp32', 'reduction', 'ordered'],
    expectations: [
      m('cycles', '>=', 1280), // 256 adds in element order, each an FPU latency (4) and a ring hop (1) after the one before
      mem('sum', 'f32', ['256']),
      m('flops', '==', 256),
    ],
  },
  {
    title: 'Kernel: gather',
    file: 'kernels/gather.s',
    tags: ['fp64', 'indexed'],
    expectations: [
      m('cycles', '>=', 256), // 256 indexed elements at one a cycle
      mem('y', 'f64', ['1', '9', '17', '25']), // table[(8 i) mod 256] + 1 = 8 i + 1 for i < 32
      m('flops', '==', 256), // the vfadd.vf: one flop per element
    ],
  },
  {
    title: 'Kernel: masked clamp',
    file: 'kernels/clamp.s',
    tags: ['int32', 'masks'],
    expectations: [
      m('flops', '==', 0), // integer only
      m('cycles', '>=', 128), // 8 KiB stored (the fill and the clamped samples) over a 64-byte store bus
      mem('s', 'i32', ['0', '0', '0', '0']), // s[0..3] = -1000, -997, -994, -991 clamp to 0
    ],
  },
  {
    title: 'Kernel: strip-mined loop',
    file: 'stripmine.s',
    tags: ['int64', 'strip-mining'],
    expectations: [
      m('flops', '==', 0),
      mem('z', 'i64', ['7', '10', '13', '16']), // z[i] = 3 i + 7
      m('cycles', '>=', 75), // x written and read (2 x 2400 bytes) and z written (2400): 4800 over the store bus
    ],
  },
  {
    title: 'Kernel: compiled daxpy',
    file: 'compiled-daxpy.s',
    tags: ['fp64', 'compiler output'],
    expectations: [
      // Each call's vector loop moves whole registers of VLEN / 64 = 128 doubles (vl1re64.v) and leaves the rest
      // to scalar code: calls of 203 and 196 elements each run one vector FMA of 128: 2 x 128 x 2 flops.
      m('flops', '==', 512),
      m('fractionOfPeak', '<=', 1),
    ],
  },
  {
    title: 'Kernel: compiled Q15 filter',
    file: 'compiled-fir.s',
    tags: ['int16', 'compiler output'],
    expectations: [
      m('flops', '==', 0), // fixed point: integer instructions only
      m('cycles', '>', 0),
    ],
  },
]

/** A kernel's scenario content, as the demo seeds it. */
export function kernelContent(k: Kernel): ScenarioContent {
  const program = fs.readFileSync(path.join(projectRoot, 'examples', k.file), 'utf8')
  return scenarioContentSchema.parse({
    title: k.title,
    description: `A kernel of the demo suite "${KERNEL_SUITE_TITLE}" (\`examples/${k.file}\`); its expectations hold on the default machine.\n\n_Results are model estimates, not sign-off for silicon._`,
    tags: ['kernel', ...k.tags],
    program,
    expectations: k.expectations,
  })
}

export async function seedKernelSuite(ctx: AppContext, workspace: Workspace, author: User): Promise<{ created: number }> {
  const existing = new Map((await Scenario.findAll({ where: { workspaceId: workspace.id }, paranoid: false, attributes: ['id', 'title'] })).map((s) => [s.title, s.id]))
  let created = 0
  const ids: string[] = []
  for (const k of KERNELS) {
    let id = existing.get(k.title)
    if (!id) {
      id = (await createScenario(ctx, author, workspace.id, { content: kernelContent(k), message: 'The kernel with its expectations on the default machine' })).id
      created++
    }
    ids.push(id)
  }
  if (!(await Suite.findOne({ where: { workspaceId: workspace.id, title: KERNEL_SUITE_TITLE } }))) {
    await Suite.create({ workspaceId: workspace.id, title: KERNEL_SUITE_TITLE, description: 'Our kernels, each with expectations that hold on the default machine: run it after a model change, or on a preset to characterise that machine.', scenarioIds: ids, presetId: null, watcherIds: [author.id], createdById: author.id })
  }
  return { created }
}
