/**
 * Static register-group checks (RISC-V V 1.0, sections 3.4.2 "Vector Register
 * Grouping", 5.2/5.3 on operand overlap and masking, 7.3 on EMUL).
 *
 * The rule: the vtype in force at each instruction is known when every path
 * reaching it passes through a vsetvli/vsetivli with the same immediate vtype
 * (a forward data-flow over branches and jumps; vsetvl, a call's return point
 * and the program start make it unknown). Where it is known, each vector operand
 * group must be aligned to its EMUL and EMUL must lie in 1/8..8. Overlap rules
 * that need no vtype (v0 under a mask, sources of slides up, gathers, compress,
 * mask scans and viota) are checked by register number always, and by whole
 * groups where the vtype is known.
 */
import type { OpInfo, VGroup } from './table'
import type { Operands, SimDiagnostic, SourceLoc } from './types'
import { diag } from './diagnostics'
import { decodeVtype, formatVtype, lmulName, type Vtype } from './vtype'

export interface CheckedInstruction {
  info: OpInfo
  operands: Operands
  address: number
  loc: SourceLoc
  /** Column of the operand that filled each key, for pointing at the culprit. */
  columns: Partial<Record<keyof Operands, number>>
}

type State = { vtype: Vtype; line: number } | 'unknown'

const same = (a: State | undefined, b: State): boolean =>
  a !== undefined && (a === 'unknown' ? b === 'unknown' : b !== 'unknown' && formatVtype(a.vtype) === formatVtype(b.vtype))

function join(a: State | undefined, b: State): State {
  if (a === undefined) return b
  return same(a, b) ? a : 'unknown'
}

/** The vtype known to be in force before each instruction (undefined: unreachable). */
export function knownVtypes(code: readonly CheckedInstruction[], entry = 0): (State | undefined)[] {
  const before: (State | undefined)[] = new Array(code.length)
  // Instructions are 4 or 2 (compressed) bytes long: targets are looked up by address.
  const at = new Map(code.map((c, i) => [c.address, i]))
  const indexOf = (address: number): number => at.get(address) ?? -1
  const work: number[] = []
  const flow = (i: number, s: State): void => {
    if (i < 0 || i >= code.length || !Number.isInteger(i)) return
    const j = join(before[i], s)
    if (!same(before[i], j)) {
      before[i] = j
      work.push(i)
    }
  }
  flow(0, 'unknown')
  flow(entry, 'unknown')
  while (work.length) {
    const i = work.pop() as number
    const c = code[i] as CheckedInstruction
    const s = before[i] as State
    let out: State = s
    if (c.info.op === 'vsetvli' || c.info.op === 'vsetivli') {
      const v = decodeVtype(c.operands.vtypei ?? 0)
      out = v ? { vtype: v, line: c.loc.line } : 'unknown'
    } else if (c.info.op === 'vsetvl') out = 'unknown'
    const op = c.info.op
    const isBranch = c.info.syntax.includes('branch')
    if (op === 'jal') {
      flow(indexOf(c.address + (c.operands.imm ?? 0)), out)
      if (c.operands.rd !== 0) flow(i + 1, 'unknown') // returns from a call with any vtype
    } else if (op === 'jalr') {
      if (c.operands.rd !== 0) flow(i + 1, 'unknown')
    } else {
      if (isBranch) flow(indexOf(c.address + (c.operands.imm ?? 0)), out)
      flow(i + 1, out)
    }
  }
  return before
}

function emul(group: VGroup, vt: Vtype, info: OpInfo): number {
  switch (group) {
    case 'single': return 1
    case 'lmul': return vt.lmul
    case 'wide': return 2 * vt.lmul
    case 'vf2': return vt.lmul / 2
    case 'vf4': return vt.lmul / 4
    case 'vf8': return vt.lmul / 8
    case 'whole': return info.nr ?? 1
    case 'eew': return ((info.eew ?? vt.sew) / vt.sew) * vt.lmul
  }
}

const KEYS = ['vd', 'vs2', 'vs1'] as const
const OVERLAP_SECTION: Record<string, string> = {
  'vector permutation': '16.3 to 16.5',
  'vector mask': '15',
}

/** Diagnostics for register groups and overlaps, in program order. */
export function checkVectorOperands(code: readonly CheckedInstruction[], entry = 0): SimDiagnostic[] {
  const out: SimDiagnostic[] = []
  const states = knownVtypes(code, entry)
  code.forEach((c, i) => {
    const { info, operands: o } = c
    if (!info.vector || info.config) return
    const st = states[i]
    const known = st !== undefined && st !== 'unknown' ? st : undefined
    const at = (key: keyof Operands): SourceLoc => ({ line: c.loc.line, column: c.columns[key] ?? c.loc.column })
    const span: Partial<Record<(typeof KEYS)[number], [number, number]>> = {}
    for (const key of KEYS) {
      const g = info.groups[key]
      const reg = o[key]
      if (g === undefined || reg === undefined) continue
      let size = 1
      if (known) {
        const e = emul(g, known.vtype, info)
        const fields = key === 'vd' && info.nf ? info.nf : 1
        const why = `vtype ${formatVtype(known.vtype)} set on line ${known.line}`
        if (e > 8 || e < 0.125 || Math.max(1, e) * fields > 8) {
          const what = fields > 1 ? `${fields} fields of EMUL ${e}` : `EMUL = ${e}`
          out.push(diag(at(key), 'emul-range', `${info.op}: ${key} needs ${what} with ${why}, outside ${fields > 1 ? 'the 8 registers a segment may use (spec 7.8)' : '1/8..8 (spec 7.3)'}`))
          continue
        }
        const align = Math.max(1, e)
        size = align * fields
        if (reg % align !== 0) {
          const what = g === 'lmul' ? `LMUL ${lmulName(known.vtype.lmul)}` : `EMUL ${lmulName(align as Vtype['lmul'])}`
          out.push(diag(at(key), 'lmul-align', `${info.op}: v${reg} is not a valid ${key} register group for ${what} (${why}): use a multiple of ${align} (spec 3.4.2)`))
        }
        if (reg + size > 32) out.push(diag(at(key), 'lmul-align', `${info.op}: the ${key} group v${reg}..v${reg + size - 1} runs past v31`))
      }
      span[key] = [reg, reg + size - 1]
    }
    const dst = span.vd
    const destWritten = dst !== undefined && !info.memory?.isStore && info.shape !== 'reduction' && info.shape !== 'ordered-reduction'
    if (o.vm === false && destWritten && !info.maskDest && dst[0] === 0) {
      out.push(diag(at('vd'), 'mask-overlap', `${info.op}: the destination v${o.vd} overlaps the mask register v0 of a masked instruction (spec 5.3)`))
    }
    if (dst) {
      for (const src of info.noOverlap) {
        const s = span[src]
        if (s && s[0] <= dst[1] && dst[0] <= s[1]) {
          const section = OVERLAP_SECTION[info.category] ?? '5.2'
          out.push(diag(at('vd'), 'overlap', `${info.op}: the destination v${o.vd} may not overlap the source ${src} v${o[src]} (spec ${section})`))
        }
      }
    }
  })
  return out
}
