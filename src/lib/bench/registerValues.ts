/**
 * Element values of a vector register for the Cycle inspector, from the
 * functional result (the register's contents at the end of the run),
 * formatted by SEW: integers in decimal (signed) and hex, FP as decimal with
 * the IEEE 754 bit pattern in hex. Which elements the register's last writer
 * has written by the cursor comes from the writer's per-lane write phase
 * (element i lives in lane i mod L, timing model section 1).
 *
 * @example
 *   formatElements(bytes, { sew: 32, float: true, count: 2 }) // [{ text: '1.5', hex: '0x3fc00000' }, ...]
 */
import type { Sew } from '@shared/sim/isa/types'
import { LANE_FIELD_COUNT, NO_CYCLE, type TimingTrace } from '@shared/sim/trace/types'
import { phaseBounds, wordsPerCycle } from './inspector'

export interface ElementText {
  /** Decimal: signed integer or FP value. */
  text: string
  /** The raw bits, 0x-prefixed, SEW / 4 digits. */
  hex: string
}

export interface FormatOptions {
  sew: Sew
  /** Interpret as IEEE 754 binary16/32/64 (SEW 8 has no FP format and stays integer). */
  float: boolean
  /** Elements to format from element 0 (default: all the register holds). */
  count?: number
}

/** IEEE 754 binary16 to a number (half precision has no typed array in ES2022). */
export function halfToNumber(bits: number): number {
  const sign = bits & 0x8000 ? -1 : 1
  const exp = (bits >> 10) & 0x1f
  const frac = bits & 0x3ff
  if (exp === 0) return sign * frac * 2 ** -24
  if (exp === 31) return frac ? NaN : sign * Infinity
  return sign * (1 + frac / 1024) * 2 ** (exp - 15)
}

function formatFloat(v: number): string {
  if (Number.isNaN(v)) return 'NaN'
  if (!Number.isFinite(v)) return v > 0 ? 'inf' : '-inf'
  if (Object.is(v, -0)) return '-0'
  // Enough digits to tell values apart, not the 17 of a full round trip.
  return String(Number(v.toPrecision(9)))
}

export function formatElements(bytes: Uint8Array, options: FormatOptions): ElementText[] {
  const { sew } = options
  const width = sew / 8
  const n = Math.min(options.count ?? Math.floor(bytes.length / width), Math.floor(bytes.length / width))
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength)
  const out: ElementText[] = []
  for (let i = 0; i < n; i++) {
    const at = i * width
    let raw: bigint
    if (sew === 8) raw = BigInt(view.getUint8(at))
    else if (sew === 16) raw = BigInt(view.getUint16(at, true))
    else if (sew === 32) raw = BigInt(view.getUint32(at, true))
    else raw = view.getBigUint64(at, true)
    const hex = `0x${raw.toString(16).padStart(width * 2, '0')}`
    let text: string
    if (options.float && sew === 16) text = formatFloat(halfToNumber(Number(raw)))
    else if (options.float && sew === 32) text = formatFloat(view.getFloat32(at, true))
    else if (options.float && sew === 64) text = formatFloat(view.getFloat64(at, true))
    else text = BigInt.asIntN(sew, raw).toString()
    out.push({ text, hex })
  }
  return out
}

export type ElementState = 'written' | 'pending' | 'maybe'

/**
 * Per element of instruction `pos` (a position in trace.instructions): written
 * by the end of `cycle`, not yet, or maybe (the write phase's bounds leave it
 * open). Element i is word floor(floor(i / L) / perWord) of lane i mod L.
 */
export function elementWriteStates(trace: TimingTrace, pos: number, cycle: number): ElementState[] {
  const ins = trace.instructions[pos]
  if (!ins) return []
  const L = trace.laneCount
  const rate = wordsPerCycle(trace, ins.unit)
  const out: ElementState[] = []
  for (let i = 0; i < ins.vl; i++) {
    const lane = i % L
    const base = (pos * L + lane) * LANE_FIELD_COUNT
    const elements = trace.laneTimes[base] ?? 0
    const beats = trace.laneTimes[base + 1] ?? 0
    const start = trace.laneTimes[base + 6] ?? NO_CYCLE
    const end = trace.laneTimes[base + 7] ?? NO_CYCLE
    if (start === NO_CYCLE || end === NO_CYCLE || beats === 0) {
      out.push('pending')
      continue
    }
    const perBeat = Math.ceil(elements / beats)
    const word = Math.floor(Math.floor(i / L) / perBeat)
    const done = phaseBounds(beats, start, end, cycle, rate)
    out.push(word < done.lo ? 'written' : word >= done.hi ? 'pending' : 'maybe')
  }
  return out
}

/**
 * True for mnemonics whose vector result is floating point: the `vf*` forms of
 * RISC-V V 1.0, except those with an integer or scalar result (vfirst, vfmv.f.s,
 * vfclass, and conversions to integer). Loads and moves carry no type: false.
 */
export function writesFloat(op: string): boolean {
  if (!op.startsWith('vf')) return false
  if (op.startsWith('vfirst') || op === 'vfmv.f.s' || op.startsWith('vfclass')) return false
  return !/^vf[wn]?cvt\.(x|xu|rtz)\./.test(op)
}
