/**
 * Opcode completeness against GNU binutils 2.40 (Debian package
 * binutils-riscv64-linux-gnu): every encoding of the corpus of encodings.ts
 * (each value of the bits that choose an operation, in every major opcode of
 * RV64GC and V 1.0, and all 49,152 16-bit half-words) is assembled with
 * `.insn` under `-march=rv64gcv` and listed by `objdump -d -M no-aliases`.
 * Each mnemonic objdump prints must be the one Chimeline decodes for the same
 * bits, and each encoding objdump does not know Chimeline must refuse: a
 * mnemonic missing from the instruction table fails here, whatever corpus.s
 * holds. The exceptions are named below with their reason.
 */
import { execFileSync } from 'node:child_process'
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { referenceToolsPresent } from '../tools'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { decodeHalf, decodeWord } from '../../../shared/sim/isa/decoder'
import { corpusHalves, corpusWords } from './encodings'

const present = referenceToolsPresent('the opcode completeness check', ['riscv64-linux-gnu-as', 'riscv64-linux-gnu-objdump'], 'riscv')

/**
 * Mnemonics objdump prints that Chimeline refuses on purpose: the privileged
 * architecture's returns, fences and waits (a user-mode program, as QEMU's
 * user mode runs, cannot execute them), the defined illegal instruction, and
 * encodings the RVC chapter reserves that binutils 2.40 still names.
 */
const NOT_FOR_USER_CODE: Record<string, string> = {
  uret: 'privileged', sret: 'privileged', mret: 'privileged', hret: 'privileged', dret: 'debug mode',
  wfi: 'privileged', 'sfence.vm': 'privileged', 'sfence.vma': 'privileged',
  'c.unimp': 'the all-zero half-word is the defined illegal instruction (RVC chapter)',
  'c.addi16sp': 'only with nzimm = 0, which the RVC chapter reserves',
}
/** Names objdump -M no-aliases gives the same bits: c.nop is c.addi zero,0; shifts by 0 are RV128's c.*64 (HINTs in RV64). */
const SAME_BITS: Record<string, string> = { 'c.addi': 'c.nop', 'c.slli64': 'c.slli', 'c.srli64': 'c.srli', 'c.srai64': 'c.srai' }

describe.skipIf(!present)('every opcode GNU binutils 2.40 decodes for rv64gcv is in the instruction table', () => {
  let dir = ''
  const rows: { bits: number; size: 2 | 4; theirs: string | undefined; line: string }[] = []
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'chimeline-opcodes-'))
    const lines = ['  .text', ...corpusWords().map((w) => `  .insn 4, 0x${w.toString(16)}`), ...corpusHalves().map((h) => `  .insn 2, 0x${h.toString(16)}`)]
    writeFileSync(join(dir, 'all.s'), `${lines.join('\n')}\n`)
    execFileSync('riscv64-linux-gnu-as', ['-march=rv64gcv', join(dir, 'all.s'), '-o', join(dir, 'all.o')])
    const dump = execFileSync('riscv64-linux-gnu-objdump', ['-d', '-M', 'no-aliases', join(dir, 'all.o')], { encoding: 'utf8', maxBuffer: 1 << 28 })
    for (const line of dump.split('\n')) {
      const m = /^\s*[0-9a-f]+:\s+([0-9a-f]{4}|[0-9a-f]{8})\s+(\S+)/.exec(line)
      // `.4byte`/`.2byte` rows are encodings objdump does not know.
      if (m) rows.push({ bits: parseInt(m[1] as string, 16), size: m[1]?.length === 4 ? 2 : 4, theirs: m[2]?.startsWith('.') ? undefined : m[2], line: line.trim() })
    }
  }, 120_000)
  afterAll(() => {
    if (dir) rmSync(dir, { recursive: true, force: true })
  })

  it('lists the whole corpus', () => {
    expect(rows.length).toBe(corpusWords().length + corpusHalves().length)
  })

  it('decodes each encoding objdump names to the same mnemonic, and refuses each one objdump does not know', () => {
    const problems = new Map<string, string>()
    const known = new Set<string>()
    for (const r of rows) {
      const d = r.size === 2 ? decodeHalf(r.bits, 0) : decodeWord(r.bits, 0)
      const ours = d.ok ? (d.instruction.compressed ?? d.instruction.op) : undefined
      const theirs = r.theirs === undefined ? undefined : SAME_BITS[r.theirs] === ours ? ours : r.theirs
      if (theirs && theirs === ours) known.add(theirs)
      if (theirs === ours || (theirs && !ours && theirs in NOT_FOR_USER_CODE)) continue
      const key = !ours ? `missing from the table: ${theirs}` : !theirs ? `decoded but unknown to binutils: ${ours}` : `${ours} where objdump says ${theirs}`
      if (!problems.has(key)) problems.set(key, r.line)
    }
    expect([...problems].map(([k, line]) => `${k} (${line})`)).toEqual([])
    // Sanity: the corpus reaches every group, and the named exceptions leave their valid encodings checked.
    for (const m of ['vlsseg8e64.v', 'vfwmacc.vv', 'c.sdsp', 'c.addi16sp', 'c.lui', 'amomaxu.d', 'fcvt.lu.d', 'vsetivli', 'vmv8r.v', 'ecall']) expect(known.has(m), m).toBe(true)
  })
})
