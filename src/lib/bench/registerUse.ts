/**
 * Which architectural vector registers each traced instruction writes and
 * reads, from its static instruction (operands and the instruction table's
 * register-group sizes) and the LMUL it ran with. This feeds the dependency
 * overlay and the register picker of the Cycle inspector; the Worker returns
 * the trace, not the dynamic stream, so the Bench derives it here.
 *
 * @example
 *   const use = registerUse(trace, program)
 *   dependenciesOf(use, 3) // [{ from: 1, to: 3 }, { from: 3, to: 4 }]
 */
import { opInfo, type VGroup } from '@shared/sim/isa'
import type { Program } from '@shared/sim/isa/types'
import type { InstructionTrace, TimingTrace } from '@shared/sim/trace/types'

export interface RegisterUse {
  /** InstructionTrace.index */
  index: number
  writes: number[]
  reads: number[]
}

function groupSize(group: VGroup | undefined, ins: InstructionTrace, eew: number | undefined): number {
  if (!group || group === 'single') return 1
  const lmul = group === 'eew' && eew ? (eew / ins.sew) * ins.lmul : ins.lmul
  return Math.max(1, Math.min(8, lmul))
}

const range = (base: number, n: number) => Array.from({ length: n }, (_, k) => base + k).filter((r) => r < 32)

export function registerUse(trace: TimingTrace, program: Program): RegisterUse[] {
  return trace.instructions.map((ins) => {
    const st = program.instructions[ins.staticIndex]
    const info = st ? opInfo(st.op) : undefined
    if (!st || !info || ins.isConfig) return { index: ins.index, writes: [], reads: [] }
    const o = st.operands
    const g = info.groups
    const reads: number[] = []
    const writes: number[] = []
    const isStore = info.memory?.isStore ?? false
    if (o.vd !== undefined && g.vd) {
      const regs = range(o.vd, groupSize(g.vd, ins, info.eew))
      if (isStore || info.readsVd) reads.push(...regs)
      if (!isStore && ins.shape !== 'scalar-result') writes.push(...regs)
    }
    if (o.vs1 !== undefined && g.vs1) reads.push(...range(o.vs1, groupSize(g.vs1, ins, info.eew)))
    if (o.vs2 !== undefined && g.vs2) reads.push(...range(o.vs2, groupSize(g.vs2, ins, info.eew)))
    if (ins.masked) reads.push(0)
    return { index: ins.index, writes: [...new Set(writes)], reads: [...new Set(reads)] }
  })
}

/**
 * Producer -> consumer arrows through registers (read after write) for one
 * instruction: from the last earlier writer of each register it reads, and to
 * each later reader of a register it writes, until that register is written again.
 */
export function dependenciesOf(uses: RegisterUse[], index: number): { from: number; to: number }[] {
  const at = uses.findIndex((u) => u.index === index)
  const me = uses[at]
  if (!me) return []
  const out: { from: number; to: number }[] = []
  const seen = new Set<string>()
  const add = (from: number, to: number) => {
    const key = `${from}>${to}`
    if (!seen.has(key)) {
      seen.add(key)
      out.push({ from, to })
    }
  }
  for (const r of me.reads) {
    for (let i = at - 1; i >= 0; i--) {
      if (uses[i]?.writes.includes(r)) {
        add(uses[i]!.index, me.index)
        break
      }
    }
  }
  for (const r of me.writes) {
    for (let i = at + 1; i < uses.length; i++) {
      const u = uses[i]!
      if (u.reads.includes(r)) add(me.index, u.index)
      if (u.writes.includes(r)) break
    }
  }
  return out
}

/** The last instruction writing register `reg` (position in the trace), or -1. */
export function lastWriter(uses: RegisterUse[], reg: number): number {
  for (let i = uses.length - 1; i >= 0; i--) if (uses[i]?.writes.includes(reg)) return i
  return -1
}

/** Registers written anywhere in the run, ascending. */
export function writtenRegisters(uses: RegisterUse[]): number[] {
  return [...new Set(uses.flatMap((u) => u.writes))].sort((a, b) => a - b)
}
