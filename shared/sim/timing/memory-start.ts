/**
 * The memory unit's start of instructions (timing model section 7): in program
 * order among memory instructions, on a free port, after every older
 * overlapping access when either side is a store.
 */
import { REASON } from '../trace/types'
import type { Inst } from './inst'
import type { MemInst } from './memory'
import type { TimingState } from './state'

const R_MEMORY = REASON.memory

/** Whether an instruction has finished before cycle c. */
function isDone(inst: Inst, c: number): boolean {
  return inst.st.complete >= 0 && inst.st.complete < c
}

/** The memory unit starts the next memory instructions, in program order, on free ports. */
export function memoryStart(s: TimingState, c: number): void {
  const ports = s.memPorts
  for (let p = 0; p < ports.length; p++) {
    const held = ports[p]
    if (held && held.busDone && held.portUntil < c) ports[p] = null
  }
  for (;;) {
    const inst = s.mem.at(s.memNext)
    if (!inst || inst.st.dispatch >= c) return
    const port = ports.indexOf(null)
    let ok = port >= 0
    if (ok) {
      // Memory dependences: wait for every older overlapping access when either side is a store.
      while (s.memLive < s.memNext && isDone(s.mem.at(s.memLive) as MemInst, c)) s.memLive++
      s.mem.dropBefore(s.memLive)
      for (let k = s.memLive; k < s.memNext && ok; k++) {
        const o = s.mem.at(k) as MemInst
        if (isDone(o, c)) continue
        if ((o.isStore || inst.isStore) && o.overlaps(inst)) ok = false
      }
    }
    if (!ok) {
      for (let l = 0; l < s.ctx.L; l++) s.ctx.deny(l, inst.st, R_MEMORY)
      return
    }
    ports[port] = inst
    inst.begin(c, port)
    s.memNext++
    s.memQueued--
  }
}
