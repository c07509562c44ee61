/**
 * Reference check against GNU binutils (Debian package binutils-riscv64-linux-gnu):
 * corpus.s is assembled by `riscv64-linux-gnu-as -march=rv64gcv` and listed by
 * `riscv64-linux-gnu-objdump -d`; Chimeline's encoder must give the same words,
 * its decoder must give back the same instructions, and its canonical text must
 * equal objdump's after normalising spaces.
 */
import { execFileSync } from 'node:child_process'
import { mkdtempSync, readFileSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { referenceToolsPresent } from '../tools'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { assemble } from '../../../shared/sim/isa/assembler'
import { encode } from '../../../shared/sim/isa/encoder'
import { parseObjdump, type ObjdumpRow } from '../../../shared/sim/isa/objdump'
import { OPS } from '../../../shared/sim/isa/table'
import type { Instruction } from '../../../shared/sim/isa/types'

const corpusPath = fileURLToPath(new URL('./corpus.s', import.meta.url))
const corpus = readFileSync(corpusPath, 'utf8')

const present = referenceToolsPresent('the binutils reference check', ['riscv64-linux-gnu-as', 'riscv64-linux-gnu-objdump'], 'riscv')

/**
 * objdump text normalised for comparison: whitespace squeezed, its `# ...`
 * comments and `<symbol+offset>` annotations dropped, and binutils 2.40's
 * immediate-form aliases (add/and/or/xor/sll/srl/sra and their *w forms with an
 * immediate) named as the ISA names them (addi/andi/ori/xori/slli/srli/srai, addiw/slliw/...), which is what Chimeline prints.
 */
function normalise(text: string): string {
  const t = text.replace(/#.*$/, '').replace(/\s*<[^>]*>/, '').replace(/\s+/g, ' ').trim()
  return t.replace(/^(add|and|or|xor|sll|srl|sra)(w?) ([a-z0-9]+),([a-z0-9]+),(-?(0x[0-9a-f]+|[0-9]+))$/, (_m, op: string, w: string, rd: string, rs: string, imm: string) => `${op}i${w} ${rd},${rs},${imm}`)
}

describe.skipIf(!present)('GNU binutils riscv64-linux-gnu-as -march=rv64gcv and objdump -d on tests/reference/binutils/corpus.s', () => {
  let dir = ''
  let rows: ObjdumpRow[] = []
  let ours: Instruction[] = []
  let decoded: Instruction[] = []

  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'chimeline-binutils-'))
    const obj = join(dir, 'corpus.o')
    execFileSync('riscv64-linux-gnu-as', ['-march=rv64gcv', corpusPath, '-o', obj])
    const dump = execFileSync('riscv64-linux-gnu-objdump', ['-d', obj], { encoding: 'utf8' })
    const read = parseObjdump(dump)
    if (!read.ok) throw new Error(read.errors.map((e) => `${e.line}:${e.column} ${e.message}`).join('\n'))
    rows = read.rows
    decoded = read.program.instructions
    // objdump's addresses start at 0; assemble at the same base so branch targets print alike.
    const r = assemble(corpus, { textBase: 0 })
    if (!r.ok) throw new Error(r.errors.map((e) => `${e.line}:${e.column} ${e.message}`).join('\n'))
    ours = r.program.instructions
  })
  afterAll(() => {
    if (dir) rmSync(dir, { recursive: true, force: true })
  })

  it('lists as many instruction words as Chimeline assembles', () => {
    expect(rows.length).toBe(ours.length)
    expect(rows.length).toBeGreaterThan(700)
  })

  it('gives the same 32-bit word for every corpus instruction as Chimeline encode()', () => {
    const diffs = ours
      .map((ins, i) => ({ line: ins.loc?.line, text: ins.text, ours: encode(ins).toString(16), theirs: rows[i]?.word.toString(16) }))
      .filter((d) => d.ours !== d.theirs)
    expect(diffs).toEqual([])
  })

  it('decodes every binutils word back to the instruction Chimeline assembled', () => {
    expect(decoded.map((d) => ({ op: d.op, operands: d.operands }))).toEqual(ours.map((a) => ({ op: a.op, operands: a.operands })))
  })

  it('prints canonical text equal to objdump -d after normalising spaces', () => {
    const diffs = decoded
      .map((d, i) => ({ line: ours[i]?.loc?.line, ours: normalise(d.text), objdump: normalise(rows[i]?.text ?? '') }))
      .filter((d) => d.ours !== d.objdump)
    expect(diffs).toEqual([])
    // the assembler's text (with labels) agrees too
    expect(ours.map((o) => normalise(o.text))).toEqual(decoded.map((d) => normalise(d.text)))
  })

  it('covers every mnemonic of the instruction table', () => {
    const used = new Set(ours.map((i) => i.op))
    expect(OPS.map((o) => o.op).filter((op) => !used.has(op))).toEqual([])
  })
})

describe('objdump text normalisation used by the binutils check', () => {
  it.each([
    ['add\ta0,a1,5', 'addi a0,a1,5'],
    ['sll\ta0,a1,0x3', 'slli a0,a1,0x3'],
    ['add\ta0,a1,a2', 'add a0,a1,a2'],
    ['jr\tt0 # fffffff0 <fwd+0x10>', 'jr t0'],
    ['bnez\ta1,c78 <fwd>', 'bnez a1,c78'],
    ['xor\ta0,a1,-1', 'xori a0,a1,-1'],
    ['sraw\tt0,sp,0x1f', 'sraiw t0,sp,0x1f'],
  ])('%j becomes %j', (a, b) => {
    expect(normalise(a)).toBe(b)
  })
})
