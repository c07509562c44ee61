/**
 * The JSON form of a trace and its zod schema: the typed arrays of the
 * compact form become arrays of plain records. `traceToJson` produces it,
 * `traceJsonSchema.parse` checks a file read back.
 */
import { z } from 'zod'
import { machineSchema } from '../../schemas/machine'
import type { TimingTrace } from './types'
import { STALL_REASONS, expandUsage, laneTiming, usageWritesAt } from './types'

const cycle = z.number().int().nonnegative()
const cycleOrNull = cycle.nullable()
const stallCounts = z.object(Object.fromEntries(STALL_REASONS.map((r) => [r, z.number().nonnegative()])) as Record<
  (typeof STALL_REASONS)[number],
  z.ZodNumber
>)

export const laneTimingSchema = z.object({
  lane: z.number().int().nonnegative(),
  elements: z.number().int().nonnegative(),
  beats: z.number().int().nonnegative(),
  readStart: cycleOrNull,
  readEnd: cycleOrNull,
  execStart: cycleOrNull,
  execEnd: cycleOrNull,
  writeStart: cycleOrNull,
  writeEnd: cycleOrNull,
})

export const instructionJsonSchema = z.object({
  index: z.number().int().nonnegative(),
  staticIndex: z.number().int().nonnegative(),
  op: z.string(),
  text: z.string(),
  vl: z.number().int().nonnegative(),
  sew: z.union([z.literal(8), z.literal(16), z.literal(32), z.literal(64)]),
  lmul: z.number(),
  unit: z.enum(['none', 'alu', 'mul', 'fpu', 'div', 'load', 'store']),
  shape: z.string(),
  masked: z.boolean(),
  isConfig: z.boolean(),
  dispatch: cycleOrNull,
  complete: cycleOrNull,
  latency: z.number().int().positive().nullable(),
  flops: z.number().nonnegative(),
  stalls: stallCounts,
  lanes: z.array(laneTimingSchema),
})

export const traceJsonSchema = z.object({
  formatVersion: z.literal(1),
  machine: machineSchema,
  laneCount: z.number().int().positive(),
  cycles: cycle,
  instructions: z.array(instructionJsonSchema),
  stalls: z.array(
    z.object({ lane: z.number().int().nonnegative(), start: cycle, length: z.number().int().positive(), reason: z.enum(STALL_REASONS), instruction: z.number().int().nonnegative() }),
  ),
  resources: z.array(
    z.object({ id: z.number().int().nonnegative(), kind: z.enum(['unit', 'bank', 'bus', 'ring']), name: z.string(), lane: z.number().int().nonnegative().nullable(), capacity: z.number().positive() }),
  ),
  usage: z.array(
    z.object({
      resource: z.number().int().nonnegative(),
      start: cycle,
      length: z.number().int().positive(),
      amount: z.number().int().positive(),
      instruction: z.number().int().nonnegative(),
      /** Bank port uses that wrote, per cycle of the span (the rest read); only on spans with a write. */
      writes: z.array(z.number().int().nonnegative()).optional(),
    }),
  ),
  metrics: z.object({
    cycles: cycle,
    flops: z.number().nonnegative(),
    flopsPerCycle: z.number().nonnegative(),
    peakFlopsPerCycle: z.number().positive(),
    flopsBySew: z.object({ '16': z.number().nonnegative(), '32': z.number().nonnegative(), '64': z.number().nonnegative() }).optional(),
    peakFlopsPerCycleBySew: z.object({ '16': z.number().positive(), '32': z.number().positive(), '64': z.number().positive() }).optional(),
    laneBusy: z.array(z.number().min(0).max(1)),
    unitUtilization: z.object({ alu: z.number(), mul: z.number(), fpu: z.number(), div: z.number() }),
    bankUtilization: z.array(z.number()),
    busUtilization: z.object({ load: z.number(), store: z.number() }),
    ringUtilization: z.number(),
    stallCycles: stallCounts,
  }),
})

export type TraceJson = z.infer<typeof traceJsonSchema>

/** The writes of each cycle of usage span i, spelled out (the JSON form does not keep the bit encoding). */
function writesOfSpan(u: TimingTrace['usage'], i: number): number[] {
  const start = u.start[i] ?? 0
  return Array.from({ length: u.length[i] ?? 0 }, (_, k) => usageWritesAt(u, i, start + k) ?? 0)
}

export function traceToJson(trace: TimingTrace): TraceJson {
  const s = trace.stalls
  // The JSON form has one span a row.
  const u = expandUsage(trace.usage)
  return {
    formatVersion: 1,
    machine: trace.machine,
    laneCount: trace.laneCount,
    cycles: trace.cycles,
    instructions: trace.instructions.map((ins) => ({
      ...ins,
      lanes: Array.from({ length: trace.laneCount }, (_, l) => laneTiming(trace, ins.index, l)),
    })),
    stalls: Array.from({ length: s.count }, (_, i) => ({
      lane: s.lane[i] ?? 0,
      start: s.start[i] ?? 0,
      length: s.length[i] ?? 0,
      reason: STALL_REASONS[s.reason[i] ?? 0] ?? 'raw',
      instruction: s.instruction[i] ?? 0,
    })),
    resources: trace.resources.map((r) => ({ ...r })),
    usage: Array.from({ length: u.count }, (_, i) => ({
      resource: u.resource[i] ?? 0,
      start: u.start[i] ?? 0,
      length: u.length[i] ?? 0,
      amount: u.amount[i] ?? 0,
      instruction: u.instruction[i] ?? 0,
      ...(u.writes && (u.writes[i] ?? 0) !== 0 ? { writes: writesOfSpan(u, i) } : {}),
    })),
    metrics: trace.metrics,
  }
}
