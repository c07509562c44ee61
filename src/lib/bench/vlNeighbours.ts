/**
 * Runs the timing model on the same dynamic stream with one vl changed, to
 * tell the user what a ragged tail costs (src/lib/bench/raggedTail.ts): every
 * non-config instruction at `from` elements is timed at `to` instead. Its
 * per-element arrays are cut, or extended the way the instruction walks
 * (addresses by the last stride, every new element active, a permutation's
 * new elements from their own index). The functional values do not matter to
 * the timing model, only where the elements are: the neighbours' cycles come from
 * these runs, never from a table or a formula.
 * Pure (no DOM): it runs in the simulator Worker.
 */
import { parseMachine, type MachineInput } from '@shared/schemas/machine'
import { assemble } from '@shared/sim/isa'
import { execute } from '@shared/sim/exec/execute'
import type { DynamicStream, VectorOp } from '@shared/sim/exec/stream'
import { simulate } from '@shared/sim/timing/simulate'

function resized<T extends Float64Array | Uint8Array | Int32Array>(a: T, to: number, extend: (i: number, a: T) => number): T {
  const out = new (a.constructor as new (n: number) => T)(to)
  out.set(a.subarray(0, Math.min(a.length, to)) as never)
  for (let i = a.length; i < to; i++) out[i] = extend(i, a)
  return out
}

function withOpVl(op: VectorOp, to: number): VectorOp {
  const next: VectorOp = { ...op, vl: to }
  if (op.memory) {
    const addr = op.memory.addresses
    const stride = addr.length >= 2 ? addr[addr.length - 1]! - addr[addr.length - 2]! : op.eew / 8
    next.memory = { ...op.memory, addresses: resized(addr, to, (i, a) => (a.length ? a[a.length - 1]! + stride * (i - a.length + 1) : stride * i)) }
  }
  if (op.active) next.active = resized(op.active, to, () => 1)
  if (op.sourceIndex) next.sourceIndex = resized(op.sourceIndex, to, (i) => i)
  return next
}

export function withVl(stream: DynamicStream, from: number, to: number): DynamicStream {
  return { ...stream, ops: stream.ops.map((op) => (!op.isConfig && op.vl === from ? withOpVl(op, to) : op)) }
}

/** Cycles of the program with its vl-`from` instructions timed at each of `toVls`; null when it does not run. */
export function neighbourCycles(source: string, machineInput: MachineInput, from: number, toVls: number[]): { vl: number; cycles: number }[] | null {
  const machine = parseMachine(machineInput)
  const asm = assemble(source)
  if (!asm.ok) return null
  const run = execute(asm.program, { vlen: machine.vlen })
  if (!run.ok) return null
  return toVls.map((vl) => ({ vl, cycles: simulate(withVl(run.stream, from, vl), machine).trace.cycles }))
}
