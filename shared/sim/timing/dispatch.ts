/**
 * The front end (timing model sections 2 and 3): scalar instructions, vset,
 * and in-order dispatch of vector instructions into the arithmetic and memory
 * queues, renaming their registers. What it dispatches in cycle c reads from
 * c + 1.
 */
import type { VectorOp } from '../exec/stream'
import { REASON } from '../trace/types'
import type { Ctx } from './context'
import type { Inst } from './inst'
import { LoadInst, MemInst, StoreInst } from './memory'
import { isMemoryOp, opClass } from './op-class'
import { PermutationInst } from './permutation'
import { hasGlobalStep } from './phases'
import { OrderedReductionInst, ReductionInst } from './reduction'
import type { TimingState } from './state'
import { UnitInst } from './units'

// Imported bindings copied once: a module binding may cost a getter call per use in the per-cycle paths.
const R_FRONTEND = REASON.frontend
const R_QUEUE = REASON.queue
const R_RENAME = REASON.rename

function makeInst(ctx: Ctx, op: VectorOp, mem: boolean, src: Int32Array[], mask: Int32Array | null): Inst {
  if (mem) {
    return op.memory?.isStore || op.unit === 'store' ? new StoreInst(ctx, op, src, mask) : new LoadInst(ctx, op, src, mask)
  }
  if (op.shape === 'ordered-reduction') return new OrderedReductionInst(ctx, op, src, mask)
  if (op.shape === 'reduction' || (op.shape === 'scalar-result' && opClass(op.op).maskScalar)) {
    return new ReductionInst(ctx, op, src, mask)
  }
  if (op.shape === 'permutation') return new PermutationInst(ctx, op, src, mask)
  return new UnitInst(ctx, op, src, mask)
}

// Which queue an op goes to, or that it is a vset the front end executes itself (TimingState.opRoute).
const TO_ARITH = 0
const TO_MEM = 1
const CONFIG = 2

export function routeOf(op: VectorOp): number {
  if (op.isConfig) return CONFIG
  return isMemoryOp(op) ? TO_MEM : TO_ARITH
}

/**
 * Tries to dispatch op `seq` in cycle c; returns false (and sets the
 * front-end reason) when it must wait. The front end asks every cycle while a
 * queue is full, so the checks before dispatch read per-op facts copied once
 * (TimingState.opRoute, opDstRegs), not the op record itself.
 */
function dispatch(s: TimingState, seq: number, c: number): boolean {
  const ctx = s.ctx
  const mem = s.opRoute[seq] === TO_MEM
  if (mem ? s.memQueued >= s.memQueueDepth : s.arithQueued >= s.arithQueueDepth) {
    s.feReason = R_QUEUE
    return false
  }
  const op = s.ops[seq] as VectorOp
  if (ctx.ren.freeCount < (s.opDstRegs[seq] ?? 0)) {
    s.feReason = R_RENAME
    return false
  }
  const ren = ctx.ren
  const src: Int32Array[] = []
  for (const g of op.srcRegs) {
    const phys = ctx.arena.i32(g.length)
    for (let k = 0; k < g.length; k++) {
      const p = ren.lookup(g[k] ?? 0)
      phys[k] = p
      ren.addReader(p)
    }
    src.push(phys)
  }
  const mask = op.masked ? Int32Array.of(ren.lookup(0)) : null
  if (mask) ren.addReader(mask[0] ?? 0)
  const inst = makeInst(ctx, op, mem, src, mask)
  inst.st.fillWork()
  const n = op.dstRegs.length
  const dst = ctx.arena.i32(n)
  const old = ctx.arena.i32(n)
  for (let k = 0; k < n; k++) {
    const [p, o] = ren.rename(op.dstRegs[k] ?? 0)
    ctx.rf.invalidate(p)
    dst[k] = p
    old[k] = o
  }
  inst.st.dst = dst
  inst.st.oldDst = old
  inst.st.dispatch = c
  s.dispatchAt[op.seq] = c
  s.inflight.push(inst.st)
  if (hasGlobalStep(inst.st)) s.globalInsts.push(inst.st)
  if (inst instanceof MemInst) {
    s.mem.push(inst)
    s.memQueued++
  } else {
    s.arith.push(inst.st)
    s.arithQueued++
  }
  return true
}

/** One front-end cycle: a scalar instruction, a vset, or up to dispatchWidth vector dispatches. */
export function frontEnd(s: TimingState, c: number): boolean {
  const ops = s.ops
  s.feReason = R_FRONTEND
  s.feDispatched = -1
  if (s.hold >= 0 || s.holdReleasedAt === c) return false
  let dispatched = 0
  for (;;) {
    if (s.opIdx >= ops.length) {
      if (dispatched > 0 || s.scalarAfterLeft === 0) return dispatched > 0
      s.scalarAfterLeft--
      return true
    }
    if (s.scalarLeft > 0) {
      if (dispatched > 0) return true
      s.scalarLeft--
      return true
    }
    // An op's seq is its index in the stream (createTimingState checks).
    const seq = s.opIdx
    if (s.opRoute[seq] === CONFIG) {
      if (dispatched > 0) return true
      s.dispatchAt[seq] = c
      s.completeAt[seq] = c
      s.feDispatched = seq
      advance(s)
      return true
    }
    if (!dispatch(s, seq, c)) return dispatched > 0
    if (dispatched === 0) s.feDispatched = seq
    dispatched++
    advance(s)
    if ((ops[seq] as VectorOp).scalarResult) {
      s.hold = seq
      return true
    }
    if (dispatched >= s.dispatchWidth) return true
  }
}

function advance(s: TimingState): void {
  s.opIdx++
  s.scalarLeft = s.ops[s.opIdx]?.scalarBefore ?? 0
}
