/**
 * The machine configuration: the one schema used by the CLI, the Worker, the
 * server and the Bench forms. Field names, defaults and ranges follow the
 * reference timing model (docs/model.md explains each field).
 *
 * @example
 *   const m = parseMachine({ lanes: 4, units: { fpu: { latency: 6 } } })
 *   m.vlen // 8192 (default)
 */
import { z } from 'zod'

const isPowerOfTwo = (v: number) => Number.isInteger(v) && v > 0 && (v & (v - 1)) === 0

/** An integer field with an inclusive range; errors name the value and the range. */
function intIn(min: number, max: number, def: number, help: string, powerOfTwo = false) {
  const range = powerOfTwo ? `${min}..${max} (powers of two)` : `${min}..${max}`
  const bad = (input: unknown) => `${JSON.stringify(input)} is outside the range ${range}`
  let s = z
    .number({ error: (iss) => `expected an integer in ${range}, got ${JSON.stringify(iss.input)}` })
    .int({ error: (iss) => `${JSON.stringify(iss.input)} is not an integer (range ${range})` })
    .min(min, { error: (iss) => bad(iss.input) })
    .max(max, { error: (iss) => bad(iss.input) })
  if (powerOfTwo) s = s.refine(isPowerOfTwo, { error: (iss) => bad(iss.input) })
  return s.default(def).describe(help)
}

function enumOf<const T extends readonly [string, ...string[]]>(values: T, def: T[number], help: string) {
  return z
    .enum(values, { error: (iss) => `${JSON.stringify(iss.input)} is not one of ${values.join(', ')}` })
    .default(def as never)
    .describe(help)
}

function bool(def: boolean, help: string) {
  return z.boolean({ error: (iss) => `expected true or false, got ${JSON.stringify(iss.input)}` }).default(def).describe(help)
}

export const ISSUE_POLICIES = ['serial', 'lockstep', 'staggered'] as const
export type IssuePolicy = (typeof ISSUE_POLICIES)[number]
/** How an unordered reduction combines its lane partials (timing model section 8): a ring walk, or a log2 L tree. */
export const INTER_LANE = ['ring', 'tree'] as const

const unitLatency = (def: number, what: string) =>
  z.object({ latency: intIn(1, 32, def, `Pipeline latency of the ${what} unit in cycles.`) }).prefault({})

export const machineSchema = z
  .object({
    lanes: intIn(1, 64, 8, 'Number of lanes; element i lives in lane i mod lanes.'),
    vlen: intIn(64, 65536, 8192, 'VLEN in bits: the size of one vector register.', true),
    fpuElementsPerCycle: z
      .object({
        '64': intIn(1, 8, 1, 'FP64 elements one FPU beat carries.'),
        '32': intIn(1, 8, 2, 'FP32 elements one FPU beat carries.'),
        '16': intIn(1, 8, 4, 'FP16 elements one FPU beat carries.'),
      })
      .prefault({})
      .describe('Elements per FPU beat, keyed by SEW.'),
    dispatchWidth: intIn(1, 4, 1, 'Vector instructions dispatched per cycle, in program order.'),
    arithQueueDepth: intIn(1, 64, 8, 'Entries of the arithmetic instruction queue.'),
    memQueueDepth: intIn(1, 64, 8, 'Entries of the memory instruction queue.'),
    physRegs: intIn(32, 256, 48, 'Physical vector registers available to renaming.'),
    laneSlots: intIn(1, 8, 3, 'Arithmetic instructions a lane holds in flight (first read to last write).'),
    issue: enumOf(ISSUE_POLICIES, 'staggered', 'When the next arithmetic instruction may start reading in a lane.'),
    chaining: bool(true, 'A consumer may read a word the cycle after its producer wrote it.'),
    rfBanks: intIn(1, 16, 6, 'Register-file banks per lane.'),
    rfPortsPerBank: intIn(1, 4, 1, 'Ports per bank; a port does one read or one write a cycle.'),
    operandQueueDepth: intIn(1, 32, 4, 'Words each source operand queue holds.'),
    units: z
      .object({
        alu: unitLatency(2, 'integer ALU'),
        mul: unitLatency(3, 'integer multiply'),
        fpu: unitLatency(4, 'floating-point'),
        div: z
          .object({ cyclesPerBeat: intIn(1, 128, 20, 'Cycles the unpipelined divider spends on one beat.') })
          .prefault({}),
      })
      .prefault({}),
    memoryPorts: intIn(1, 4, 1, 'Memory instructions served at a time.'),
    memLatency: intIn(0, 1000, 16, 'Cycles from the start of a load to its first data.'),
    loadBusBits: intIn(64, 4096, 512, 'Width of the load bus in bits.', true),
    storeBusBits: intIn(64, 4096, 512, 'Width of the store bus in bits.', true),
    gatherElementsPerCycle: intIn(1, 16, 1, 'Elements a strided or indexed access moves per cycle.'),
    reductionAccumulators: intIn(1, 16, 4, 'Partial results per lane in an unordered reduction.'),
    interLane: enumOf(INTER_LANE, 'ring', 'How lane partials of a reduction are combined.'),
    ringHopLatency: intIn(1, 16, 1, 'Cycles a word takes over one ring link.'),
    ringBidirectional: bool(false, 'Permutations may take the shorter way round the ring.'),
  })
  .strict()
  .superRefine((m, ctx) => {
    if (m.vlen < 64 * m.lanes) {
      ctx.addIssue({
        code: 'custom',
        path: ['vlen'],
        input: m.vlen,
        message: `${m.vlen} is outside the range: vlen must be at least 64 x lanes = ${64 * m.lanes}`,
      })
    }
  })

/** A complete, validated machine. */
export type Machine = z.output<typeof machineSchema>
/** What a user may write: every field optional, defaults fill in. */
export type MachineInput = z.input<typeof machineSchema>

export interface MachineFieldIssue {
  /** Dotted field name, e.g. `units.fpu.latency`. */
  field: string
  message: string
}

export class MachineConfigError extends Error {
  readonly issues: MachineFieldIssue[]
  constructor(issues: MachineFieldIssue[]) {
    super(issues.map((i) => `${i.field}: ${i.message}`).join('; '))
    this.name = 'MachineConfigError'
    this.issues = issues
  }
}

function issuesOf(error: z.ZodError): MachineFieldIssue[] {
  return error.issues.map((i) => {
    const field = i.path.map(String).join('.') || '(machine)'
    const message = i.code === 'unrecognized_keys' ? `unknown field(s) ${i.keys.join(', ')}` : i.message
    return { field: i.code === 'unrecognized_keys' && i.path.length === 0 ? i.keys.join(', ') : field, message }
  })
}

/** Validates a machine configuration; throws a MachineConfigError naming each bad field, value and range. */
export function parseMachine(input: unknown): Machine {
  const r = machineSchema.safeParse(input ?? {})
  if (!r.success) throw new MachineConfigError(issuesOf(r.error))
  return r.data
}

/** Like parseMachine but returns the issues instead of throwing. */
export function checkMachine(input: unknown): { ok: true; machine: Machine } | { ok: false; issues: MachineFieldIssue[] } {
  const r = machineSchema.safeParse(input ?? {})
  return r.success ? { ok: true, machine: r.data } : { ok: false, issues: issuesOf(r.error) }
}

/** The handbook defaults. */
export const defaultMachine: Machine = parseMachine({})
