/**
 * Producers, consumers and written registers of a run, from the register use
 * of each dynamic instruction that the Worker returns with the trace
 * (shared/sim/registerGroups.ts). This feeds the dependency overlay and the
 * register picker of the Cycle inspector. Instructions are trace positions
 * (InstructionTrace.index).
 *
 * A source group's producer is the last earlier instruction that wrote any
 * register of that group; a mask read is the group {v0}.
 *
 * @example
 *   dependenciesOf(sim.registers.value, 3) // [{ from: 1, to: 3 }, { from: 3, to: 4 }]
 */
import { registersIn, type RegisterGroups } from '@shared/sim/registerGroups'
import type { DependencyPair } from '@/lib/lanechart/dependencies'

const groupsOf = (g: RegisterGroups, i: number) => g.sources.subarray(g.sourceStart[i], g.sourceStart[i + 1])

/** The producer of one source group read by instruction `at`: the last earlier writer of any of its registers, or -1. */
function producerOf(g: RegisterGroups, at: number, group: number): number {
  for (let i = at - 1; i >= 0; i--) if ((g.writes[i]! & group) !== 0) return i
  return -1
}

/**
 * Producer -> consumer arrows for one instruction: from the producer of each
 * group it reads, and to each later instruction that reads a group it is the
 * producer of.
 */
export function dependenciesOf(g: RegisterGroups | null, index: number): DependencyPair[] {
  if (!g || !Number.isInteger(index) || index < 0 || index >= g.count) return []
  const out: DependencyPair[] = []
  const seen = new Set<number>()
  for (const group of groupsOf(g, index)) {
    const p = producerOf(g, index, group)
    if (p >= 0 && !seen.has(p)) {
      seen.add(p)
      out.push({ from: p, to: index })
    }
  }
  const mine = g.writes[index]!
  // Registers written after `index` so far: a group touching one of them has a younger producer.
  let since = 0
  for (let u = index + 1; u < g.count && (mine & ~since) !== 0; u++) {
    if (groupsOf(g, u).some((group) => (group & mine) !== 0 && (group & since) === 0)) out.push({ from: index, to: u })
    since |= g.writes[u]!
  }
  return out
}

/** The last instruction writing register `reg`, or -1. */
export function lastWriter(g: RegisterGroups | null, reg: number): number {
  if (!g) return -1
  const bit = 1 << reg
  for (let i = g.count - 1; i >= 0; i--) if ((g.writes[i]! & bit) !== 0) return i
  return -1
}

/** Registers written anywhere in the run, ascending. */
export function writtenRegisters(g: RegisterGroups | null): number[] {
  if (!g) return []
  let all = 0
  for (let i = 0; i < g.count; i++) all |= g.writes[i]!
  return registersIn(all >>> 0)
}

/** The lowest register an instruction writes (the base of its destination group), or null. */
export function firstWritten(g: RegisterGroups | null, index: number): number | null {
  if (!g || index < 0 || index >= g.count) return null
  return registersIn(g.writes[index]!)[0] ?? null
}
