/**
 * The Machine form's fields, generated from the shared zod machine schema:
 * each field's dotted name, kind, range, default and help text come from the
 * schema (through zod's JSON Schema output), so a field added there shows up
 * in the form without a change here. What the schema does not carry is a
 * short label and the group a field belongs to; a field missing from the
 * group map lands in "Other".
 *
 * @example
 *   machineFields().find((f) => f.path === 'lanes') // { kind: 'integer', min: 1, max: 64, default: 8, help: 'Number of lanes; ...' }
 */
import { z } from 'zod'
import { machineSchema, parseMachine, type Machine, type MachineFieldIssue, type MachineInput } from '@shared/schemas/machine'
import type { Preset } from '@shared/sim/presets'

export type FieldKind = 'integer' | 'enum' | 'boolean'

export interface MachineField {
  /** Dotted name as the CLI's --set and the validation messages use it, e.g. `units.fpu.latency`. */
  path: string
  label: string
  help: string
  kind: FieldKind
  min?: number
  max?: number
  /** Only powers of two are valid (the schema's refinement; probed, since JSON Schema cannot say it). */
  powerOfTwo?: boolean
  options?: string[]
  default: number | string | boolean
  group: GroupId
}

export const GROUPS = [
  { id: 'lanes', title: 'Lanes and vector length' },
  { id: 'issue', title: 'Issue and chaining' },
  { id: 'regfile', title: 'Register file' },
  { id: 'units', title: 'Units' },
  { id: 'memory', title: 'Memory' },
  { id: 'reductions', title: 'Reductions and ring' },
  { id: 'other', title: 'Other' },
] as const
export type GroupId = (typeof GROUPS)[number]['id']

/** Group and short label per field; the help text is the schema's own description. */
const PLACEMENT: Record<string, [GroupId, string]> = {
  lanes: ['lanes', 'Lanes'],
  vlen: ['lanes', 'VLEN (bits)'],
  'fpuElementsPerCycle.64': ['lanes', 'FPU elements per beat, SEW 64'],
  'fpuElementsPerCycle.32': ['lanes', 'FPU elements per beat, SEW 32'],
  'fpuElementsPerCycle.16': ['lanes', 'FPU elements per beat, SEW 16'],
  issue: ['issue', 'Issue policy'],
  chaining: ['issue', 'Chaining'],
  dispatchWidth: ['issue', 'Dispatch width'],
  arithQueueDepth: ['issue', 'Arithmetic queue depth'],
  memQueueDepth: ['issue', 'Memory queue depth'],
  laneSlots: ['issue', 'Lane slots'],
  physRegs: ['regfile', 'Physical registers'],
  rfBanks: ['regfile', 'Banks per lane'],
  rfPortsPerBank: ['regfile', 'Ports per bank'],
  operandQueueDepth: ['regfile', 'Operand queue depth'],
  'units.alu.latency': ['units', 'ALU latency'],
  'units.mul.latency': ['units', 'Multiplier latency'],
  'units.fpu.latency': ['units', 'FPU latency'],
  'units.div.cyclesPerBeat': ['units', 'Divider cycles per beat'],
  memoryPorts: ['memory', 'Memory ports'],
  memLatency: ['memory', 'Memory latency'],
  loadBusBits: ['memory', 'Load bus (bits)'],
  storeBusBits: ['memory', 'Store bus (bits)'],
  gatherElementsPerCycle: ['memory', 'Gather elements per cycle'],
  reductionAccumulators: ['reductions', 'Accumulators per lane'],
  interLane: ['reductions', 'Inter-lane combine'],
  ringHopLatency: ['reductions', 'Ring hop latency'],
  ringBidirectional: ['reductions', 'Bidirectional ring'],
}

interface JsonNode {
  type?: string
  description?: string
  default?: unknown
  minimum?: number
  maximum?: number
  enum?: unknown[]
  properties?: Record<string, JsonNode>
}

/** The zod schema of one leaf field, to probe what JSON Schema cannot express. */
function leafSchema(path: string[]): z.ZodType | null {
  let s: unknown = machineSchema
  for (const key of path) {
    const shape = (s as { shape?: Record<string, unknown> }).shape ?? (s as { unwrap?: () => { shape?: Record<string, unknown> } }).unwrap?.().shape
    const next = shape?.[key]
    if (!next) return null
    s = next
  }
  return s as z.ZodType
}

function isPowerOfTwoOnly(path: string[], min: number, max: number): boolean {
  const s = leafSchema(path)
  if (!s || min + 1 > max || (min & (min - 1)) !== 0) return false
  return s.safeParse(min).success && !s.safeParse(min + 1).success
}

let cached: MachineField[] | null = null

/** Every leaf field of the machine schema, in schema order. */
export function machineFields(): MachineField[] {
  if (cached) return cached
  const root = z.toJSONSchema(machineSchema, { io: 'input', unrepresentable: 'any' }) as JsonNode
  const out: MachineField[] = []
  const walk = (node: JsonNode, path: string[]) => {
    if (node.type === 'object' && node.properties) {
      // Numeric keys (SEW) read best from the widest element down.
      const keys = Object.keys(node.properties)
      if (keys.every((k) => /^\d+$/.test(k))) keys.sort((a, b) => Number(b) - Number(a))
      for (const k of keys) walk(node.properties[k] as JsonNode, [...path, k])
      return
    }
    const dotted = path.join('.')
    const [group, label] = PLACEMENT[dotted] ?? ['other', dotted]
    const base = { path: dotted, label, help: node.description ?? '', group }
    if (node.enum) out.push({ ...base, kind: 'enum', options: node.enum.map(String), default: String(node.default ?? node.enum[0]) })
    else if (node.type === 'boolean') out.push({ ...base, kind: 'boolean', default: Boolean(node.default) })
    else {
      const min = node.minimum ?? 0
      const max = node.maximum ?? Number.MAX_SAFE_INTEGER
      out.push({ ...base, kind: 'integer', min, max, default: Number(node.default ?? min), ...(isPowerOfTwoOnly(path, min, max) ? { powerOfTwo: true } : {}) })
    }
  }
  walk(root, [])
  cached = out
  return out
}

/** The form's label of a dotted machine field ("rfBanks" -> "Banks per lane"); the path itself for an unknown one. */
export function machineFieldLabel(path: string): string {
  return machineFields().find((f) => f.path === path)?.label ?? path
}

/** Reads a dotted field of a machine (or machine input). */
export function getField(machine: MachineInput | Machine, path: string): unknown {
  let v: unknown = machine
  for (const k of path.split('.')) v = v && typeof v === 'object' ? (v as Record<string, unknown>)[k] : undefined
  return v
}

/**
 * A copy of `machine` with one dotted field set; the input is not changed.
 * Only the objects along the path are copied (spread), so this works on
 * reactive proxies too, which structuredClone refuses.
 */
export function setField<T extends MachineInput | Machine>(machine: T, path: string, value: unknown): T {
  const keys = path.split('.')
  const set = (o: unknown, i: number): unknown => {
    const obj = o && typeof o === 'object' ? (o as Record<string, unknown>) : {}
    const k = keys[i] as string
    return { ...obj, [k]: i === keys.length - 1 ? value : set(obj[k], i + 1) }
  }
  return set(machine, 0) as T
}

/** Validation issues by dotted field name, for messages under each field. */
export function issuesByField(issues: MachineFieldIssue[]): Record<string, string> {
  const out: Record<string, string> = {}
  for (const i of issues) out[i.field] = out[i.field] ? `${out[i.field]}; ${i.message}` : i.message
  return out
}

/** Fields whose value differs between two machines, as dotted names. */
export function changedFields(a: Machine, b: Machine): string[] {
  return machineFields()
    .map((f) => f.path)
    .filter((p) => getField(a, p) !== getField(b, p))
}

/** The preset whose machine equals `m` field for field, or null (a machine of the user's own, or an invalid draft). */
export function matchingPreset(m: Machine | null, presets: readonly Preset[]): Preset | null {
  if (!m) return null
  return presets.find((p) => changedFields(m, parseMachine(p.machine)).length === 0) ?? null
}

/**
 * The compact summary line, e.g. "8 lanes, VLEN 16384, staggered, 5x1 banks":
 * lanes, VLEN, issue policy, banks x ports per bank, and chaining when off.
 */
export function machineSummary(m: Machine): string {
  const parts = [`${m.lanes} lane${m.lanes === 1 ? '' : 's'}`, `VLEN ${m.vlen}`, m.issue, `${m.rfBanks}x${m.rfPortsPerBank} banks`]
  if (!m.chaining) parts.push('no chaining')
  return parts.join(', ')
}
