/**
 * Numbers derived once from the machine: lane geometry, unit latencies and
 * how many elements one beat of a unit carries at a given SEW.
 */
import type { Machine } from '../../schemas/machine'
import type { Sew } from '../isa/types'

export const UNITS = ['alu', 'mul', 'fpu', 'div'] as const
export type ExecUnit = (typeof UNITS)[number]
export const UNIT_INDEX: Record<ExecUnit, number> = { alu: 0, mul: 1, fpu: 2, div: 3 }
/** Units a lane has: the stride of the per-lane unit arrays ([lane][unit]). */
export const UNIT_COUNT = UNITS.length

export interface Derived {
  machine: Machine
  lanes: number
  banks: number
  ports: number
  /** 64-bit words of one vector register in one lane. */
  wordsPerRegLane: number
  queueDepth: number
}

export function derive(machine: Machine): Derived {
  const lanes = machine.lanes
  return {
    machine,
    lanes,
    banks: machine.rfBanks,
    ports: machine.rfPortsPerBank,
    wordsPerRegLane: Math.ceil(machine.vlen / 64 / lanes),
    queueDepth: machine.operandQueueDepth,
  }
}

/** Cycles from a beat entering the unit to its result asking for a write port. */
export function unitLatency(m: Machine, unit: ExecUnit): number {
  switch (unit) {
    case 'alu':
      return m.units.alu.latency
    case 'mul':
      return m.units.mul.latency
    case 'fpu':
      return m.units.fpu.latency
    case 'div':
      return m.units.div.cyclesPerBeat
  }
}

/** Elements one beat carries (handbook section 1); the divider takes one element a beat. */
export function elementsPerBeat(m: Machine, unit: ExecUnit, sew: Sew): number {
  if (unit === 'fpu') {
    const key = String(sew) as '64' | '32' | '16'
    return m.fpuElementsPerCycle[key] ?? 64 / sew
  }
  if (unit === 'div') return 1
  return 64 / sew
}

/** Active elements of lane l for vector length vl on L lanes: max(0, ceil((vl - l) / L)). */
export function laneElements(vl: number, lane: number, lanes: number): number {
  return Math.max(0, Math.ceil((vl - lane) / lanes))
}

/** 64-bit words that n elements of `bits` bits fill. */
export function wordsFor(n: number, bits: number): number {
  return Math.ceil((n * bits) / 64)
}
