/**
 * Compares a dump, read back with the grammar-based reader, with the trace it
 * was written from: for every lane, phase and cycle the instructions the dump
 * shows must be exactly those whose phase span covers the cycle, and the stall
 * signals must match laneStallAt. Returns the mismatches (empty when all agree).
 */
import { laneStallAt, laneTiming, STALL_REASONS, type TimingTrace } from '../../../shared/sim/trace/types'
import { parseVcd, valueAt, type VcdFile } from './vcdReader'

const PHASES = [['read', 'readStart', 'readEnd'], ['exec', 'execStart', 'execEnd'], ['write', 'writeStart', 'writeEnd']] as const

const decode = (bits: string | undefined) => (bits === undefined || bits.includes('x') ? null : parseInt(bits, 2))

export function vcdMismatches(text: string, trace: TimingTrace, limit = 20): string[] {
  const f: VcdFile = parseVcd(text)
  const bad: string[] = []
  const note = (m: string) => {
    if (bad.length < limit) bad.push(m)
  }
  for (let lane = 0; lane < trace.laneCount; lane++) {
    const scoped = f.vars.filter((v) => v.scope.join('.') === `chimeline.lane${lane}`)
    if (scoped.length === 0) note(`no scope chimeline.lane${lane}`)
    const spans = trace.instructions.map((_, i) => laneTiming(trace, i, lane))
    for (const [phase, startKey, endKey] of PHASES) {
      const slots = scoped.filter((v) => v.reference === phase || v.reference.startsWith(`${phase}_`))
      for (let cycle = 0; cycle <= trace.cycles; cycle++) {
        const want = spans
          .map((s, i) => ({ s, i }))
          .filter(({ s }) => s[startKey] !== null && s[startKey]! <= cycle && cycle <= s[endKey]!)
          .map(({ i }) => trace.instructions[i]!.index)
          .sort((a, b) => a - b)
        const got = slots
          .map((v) => decode(valueAt(f, v.id, cycle)))
          .filter((v): v is number => v !== null)
          .sort((a, b) => a - b)
        if (want.join() !== got.join()) note(`lane ${lane} ${phase} cycle ${cycle}: dump [${got}] trace [${want}]`)
      }
    }
    const stall = scoped.find((v) => v.reference === 'stall')
    const stallInstr = scoped.find((v) => v.reference === 'stall_instr')
    if (!stall || !stallInstr) {
      note(`lane ${lane}: no stall signals`)
      continue
    }
    for (let cycle = 0; cycle < trace.cycles; cycle++) {
      const s = laneStallAt(trace, lane, cycle)
      const code = decode(valueAt(f, stall.id, cycle))
      const instr = decode(valueAt(f, stallInstr.id, cycle))
      const wantCode = s ? STALL_REASONS.indexOf(s.reason) + 1 : 0
      if (code !== wantCode || instr !== (s ? s.instruction : null)) {
        note(`lane ${lane} stall cycle ${cycle}: dump ${code}/${instr} trace ${wantCode}/${s?.instruction ?? null}`)
      }
    }
  }
  return bad
}
