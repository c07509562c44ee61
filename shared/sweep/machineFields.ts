/**
 * Dotted machine field names (`lanes`, `units.fpu.latency`) over a plain
 * machine record: the leaves of the fully defaulted machine are the fields a
 * sweep may vary, so a typo is named instead of ignored.
 */
import { defaultMachine } from '../schemas/machine'

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v)

function leaves(node: Record<string, unknown>, prefix: string): string[] {
  return Object.entries(node).flatMap(([k, v]) => (isRecord(v) ? leaves(v, `${prefix}${k}.`) : [`${prefix}${k}`]))
}

/** Every dotted leaf field of the machine schema, in schema order. */
export const MACHINE_FIELD_PATHS: readonly string[] = leaves(defaultMachine as unknown as Record<string, unknown>, '')

export const isMachineField = (path: string) => MACHINE_FIELD_PATHS.includes(path)

/** Deep merge of a partial machine over a full one; arrays and scalars replace. */
export function mergeMachineRecord(base: Record<string, unknown>, partial: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = structuredClone(base)
  for (const [key, value] of Object.entries(partial)) {
    out[key] = isRecord(value) && isRecord(out[key]) ? mergeMachineRecord(out[key], value) : value
  }
  return out
}

/** A copy of `machine` with the dotted field set (the path must be a known leaf, see isMachineField). */
export function withMachineField(machine: Record<string, unknown>, path: string, value: unknown): Record<string, unknown> {
  const out = structuredClone(machine)
  const keys = path.split('.')
  let node = out
  for (const key of keys.slice(0, -1)) {
    if (!isRecord(node[key])) node[key] = {}
    node = node[key] as Record<string, unknown>
  }
  node[keys[keys.length - 1] as string] = value
  return out
}

/** The value of a dotted field, or undefined. */
export function machineFieldValue(machine: Record<string, unknown>, path: string): unknown {
  let node: unknown = machine
  for (const key of path.split('.')) node = isRecord(node) ? node[key] : undefined
  return node
}
