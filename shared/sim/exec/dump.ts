/**
 * Reads typed values out of a run's data memory: the `--dump LABEL:COUNT:TYPE`
 * of the CLI and the value tables of the Bench. 64-bit integers come back as
 * decimal strings (JSON numbers cannot hold them); FP values that JSON cannot
 * write (NaN, infinities, -0) as the strings "NaN", "Infinity", "-Infinity", "-0".
 */
import type { Program } from '../isa/types'

export const DUMP_TYPES = ['i8', 'u8', 'i16', 'u16', 'i32', 'u32', 'i64', 'u64', 'f32', 'f64'] as const
export type DumpType = (typeof DUMP_TYPES)[number]

export interface DumpRequest {
  label: string
  count: number
  type: DumpType
}

export type DumpValue = number | string

const SIZE: Record<DumpType, number> = { i8: 1, u8: 1, i16: 2, u16: 2, i32: 4, u32: 4, i64: 8, u64: 8, f32: 4, f64: 8 }

/** Parses `LABEL:COUNT:TYPE`; returns an error message naming the bad field. */
export function parseDumpRequest(text: string): { ok: true; request: DumpRequest } | { ok: false; message: string } {
  const parts = text.split(':')
  if (parts.length !== 3) return { ok: false, message: `--dump ${text}: expected LABEL:COUNT:TYPE, e.g. result:8:f64` }
  const [label, countText, type] = parts as [string, string, string]
  if (!/^[A-Za-z_.$][\w.$]*$/.test(label)) return { ok: false, message: `--dump ${text}: LABEL '${label}' is not a label name` }
  if (!/^[1-9]\d{0,8}$/.test(countText)) return { ok: false, message: `--dump ${text}: COUNT '${countText}' must be a positive integer` }
  if (!(DUMP_TYPES as readonly string[]).includes(type)) return { ok: false, message: `--dump ${text}: TYPE '${type}' must be one of ${DUMP_TYPES.join(', ')}` }
  return { ok: true, request: { label, count: Number(countText), type: type as DumpType } }
}

function fpValue(x: number): DumpValue {
  if (Number.isNaN(x)) return 'NaN'
  if (x === Infinity) return 'Infinity'
  if (x === -Infinity) return '-Infinity'
  return Object.is(x, -0) ? '-0' : x
}

/** The values of one dump request, or an error message (unknown label, range past the data segment). */
export function readDump(program: Program, memory: Uint8Array, req: DumpRequest): { ok: true; values: DumpValue[] } | { ok: false; message: string } {
  const address = program.symbols[req.label]
  if (address === undefined) return { ok: false, message: `--dump: no label '${req.label}' in the program` }
  const size = SIZE[req.type]
  const off = address - program.dataBase
  if (off < 0 || off + req.count * size > memory.length) {
    return { ok: false, message: `--dump ${req.label}:${req.count}:${req.type}: ${req.count * size} bytes at '${req.label}' run outside the data segment (${memory.length} bytes)` }
  }
  const view = new DataView(memory.buffer, memory.byteOffset, memory.byteLength)
  const values: DumpValue[] = []
  for (let i = 0; i < req.count; i++) {
    const at = off + i * size
    switch (req.type) {
      case 'i8': values.push(view.getInt8(at)); break
      case 'u8': values.push(view.getUint8(at)); break
      case 'i16': values.push(view.getInt16(at, true)); break
      case 'u16': values.push(view.getUint16(at, true)); break
      case 'i32': values.push(view.getInt32(at, true)); break
      case 'u32': values.push(view.getUint32(at, true)); break
      case 'i64': values.push(view.getBigInt64(at, true).toString()); break
      case 'u64': values.push(view.getBigUint64(at, true).toString()); break
      case 'f32': values.push(fpValue(view.getFloat32(at, true))); break
      case 'f64': values.push(fpValue(view.getFloat64(at, true))); break
    }
  }
  return { ok: true, values }
}
