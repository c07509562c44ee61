/**
 * Reference check of the ELF reader (server/services/elf) against GNU
 * binutils (Debian package binutils-riscv64-linux-gnu): kernels.s is
 * assembled by riscv64-linux-gnu-as and linked by riscv64-linux-gnu-ld; the
 * functions Chimeline lists must be the FUNC symbols `readelf -sW` prints at
 * the addresses `nm` prints, and each function's decoded instructions must be
 * the words and text `objdump -d` prints.
 */
import { execFileSync } from 'node:child_process'
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'
import { referenceToolsPresent } from '../tools'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { decodeFunction, listFunctions } from '../../../server/services/elf/import'
import { ElfError, readElf } from '../../../server/services/elf/reader'
import { assemble } from '../../../shared/sim/isa/assembler'
import { encode, encodeSized } from '../../../shared/sim/isa/encoder'

const kernels = fileURLToPath(new URL('./kernels.s', import.meta.url))

const present = referenceToolsPresent(
  'the ELF reader reference check',
  ['as', 'ld', 'objdump', 'nm', 'readelf'].map((tool) => `riscv64-linux-gnu-${tool}`),
  'riscv',
)

const run = (tool: string, args: string[]) => execFileSync(`riscv64-linux-gnu-${tool}`, args, { encoding: 'utf8' })

/** FUNC symbols as `readelf -sW` prints them: name -> { value, size }. */
function readelfFunctions(file: string): Map<string, { value: number; size: number }> {
  const out = new Map<string, { value: number; size: number }>()
  for (const line of run('readelf', ['-sW', file]).split('\n')) {
    const m = /^\s*\d+:\s+([0-9a-f]+)\s+(\d+)\s+FUNC\s+\S+\s+\S+\s+\d+\s+(\S+)$/.exec(line)
    if (m) out.set(m[3] as string, { value: parseInt(m[1] as string, 16), size: Number(m[2]) })
  }
  return out
}

/** `nm` addresses: name -> value. */
function nmAddresses(file: string): Map<string, number> {
  return new Map(run('nm', [file]).trim().split('\n').map((l) => l.split(' ')).map(([v, , n]) => [n as string, parseInt(v as string, 16)]))
}

/**
 * objdump text normalised as in tests/reference/binutils: spaces squeezed,
 * `<symbol>` notes dropped, and binutils 2.40's immediate-form aliases
 * (add/and/or/sll/srl/sra with an immediate) named as the ISA names them.
 */
function normalise(text: string): string {
  const t = text.replace(/#.*$/, '').replace(/\s*<[^>]*>/, '').replace(/\s+/g, ' ').trim()
  return t.replace(/^(add|and|or|xor|sll|srl|sra)(w?) ([a-z0-9]+),([a-z0-9]+),(-?(0x[0-9a-f]+|[0-9]+))$/, (_m, op: string, w: string, rd: string, rs: string, imm: string) => `${op}i${w} ${rd},${rs},${imm}`)
}

/** objdump -d rows of one function: address, word and normalised text. */
function objdumpRows(file: string, fn: string): { address: number; word: number; text: string }[] {
  const lines = run('objdump', ['-d', `--disassemble=${fn}`, file]).split('\n')
  const rows = []
  for (const line of lines) {
    const m = /^\s*([0-9a-f]+):\s+([0-9a-f]{8})\s+(.*)$/.exec(line)
    if (m) rows.push({ address: parseInt(m[1] as string, 16), word: parseInt(m[2] as string, 16), text: normalise(m[3] as string) })
  }
  return rows
}

describe.skipIf(!present)('the ELF reader against GNU binutils on tests/reference/elf/kernels.s', () => {
  let dir = ''
  let obj = ''
  let exe = ''
  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'chimeline-elf-'))
    obj = join(dir, 'kernels.o')
    exe = join(dir, 'kernels')
    run('as', ['-march=rv64gv', kernels, '-o', obj])
    run('ld', ['--no-relax', '-e', 'saxpy', obj, '-o', exe])
  })
  afterAll(() => {
    if (dir) rmSync(dir, { recursive: true, force: true })
  })

  it.each([['object file', () => obj], ['executable', () => exe]])('lists the FUNC symbols readelf -sW shows, at the addresses nm shows (%s)', (_kind, file) => {
    const ours = listFunctions(readElf(readFileSync(file())))
    const theirs = readelfFunctions(file())
    const nm = nmAddresses(file())
    expect(ours.map((f) => f.name).sort()).toEqual([...theirs.keys()].sort())
    for (const f of ours) {
      expect({ name: f.name, address: f.address, size: f.size }).toEqual({ name: f.name, address: theirs.get(f.name)?.value, size: theirs.get(f.name)?.size })
      expect(f.address).toBe(nm.get(f.name))
      expect(f.instructions).toBe(f.size / 4)
    }
  })

  it.each([
    ['saxpy', 'object file'],
    ['dot', 'object file'],
    ['saxpy', 'executable'],
    ['dot', 'executable'],
    ['scale_table', 'executable'],
  ])('decodes %s from the %s to the words and text objdump -d prints', (fn, kind) => {
    const file = kind === 'executable' ? exe : obj
    const decoded = decodeFunction(readFileSync(file), fn, 1000)
    const rows = objdumpRows(file, fn)
    expect(rows.length).toBeGreaterThan(2)
    expect(decoded.instructions.map((i) => ({ address: i.address, word: encode(i) >>> 0, text: i.text.replace(/\s+/g, ' ') }))).toEqual(rows)
  })

  it('refuses a function of an object file whose bytes the linker still has to fill in (la of data)', () => {
    expect(() => decodeFunction(readFileSync(obj), 'scale_table', 1000)).toThrow(/^scale_table\+0x0 needs the linker \(relocation type 23 against table\); link it first/)
  })

  it('names what is wrong with a truncated file, a 32-bit file, another machine and a file that is no ELF', () => {
    const bytes = readFileSync(exe)
    const codeOf = (b: Uint8Array) => {
      try {
        readElf(b)
      } catch (err) {
        return { code: (err as ElfError).code, message: (err as ElfError).message }
      }
      return null
    }
    expect(codeOf(bytes.subarray(0, 40))?.code).toBe('truncated')
    expect(codeOf(bytes.subarray(0, bytes.length - 100))).toMatchObject({ code: 'truncated', message: expect.stringMatching(/^the file ends at byte \d+, inside the section header table/) })
    const rv32 = join(dir, 'k32.o')
    writeFileSync(join(dir, 'k32.s'), '  .text\n  .globl f\n  .type f, @function\nf:\n  ret\n')
    run('as', ['-march=rv32gc', '-mabi=ilp32', join(dir, 'k32.s'), '-o', rv32])
    expect(codeOf(readFileSync(rv32))).toEqual({ code: 'elf-class', message: 'a 32-bit ELF file; Chimeline reads 64-bit RISC-V (ELFCLASS64) only' })
    const x86 = join(dir, 'x86.o')
    writeFileSync(join(dir, 'x86.s'), '  .text\n  .globl f\nf:\n  ret\n')
    try {
      execFileSync('as', ['--64', join(dir, 'x86.s'), '-o', x86], { stdio: 'ignore' })
    } catch {
      // No host assembler: the same file with e_machine (offset 18) set to EM_X86_64 (62), as the gABI numbers it.
      const patched = Buffer.from(bytes)
      patched.writeUInt16LE(62, 18)
      writeFileSync(x86, patched)
    }
    expect(codeOf(readFileSync(x86))).toEqual({ code: 'elf-machine', message: 'built for x86-64 (e_machine 62), not RISC-V (e_machine 243)' })
    expect(codeOf(new TextEncoder().encode('  vadd.vv v1, v2, v3\n'))?.code).toBe('not-elf')
  })

  it('decodes every RV64C form GNU as writes to the 32-bit instruction and the text objdump -d prints (unprivileged ISA, chapter C)', () => {
    // One line per 16-bit form of RV64C (the RVC listings for RV64), with operands GNU as compresses.
    const forms = [
      'c.addi4spn a0, sp, 16', 'c.fld fa0, 8(a1)', 'c.lw a2, 4(a3)', 'c.ld a4, 16(a5)', 'c.fsd fa1, 24(s0)', 'c.sw s1, 8(a0)', 'c.sd a1, 248(a2)',
      'c.nop', 'c.addi a0, -32', 'c.addiw a1, 31', 'c.li a2, -1', 'c.addi16sp sp, -64', 'c.lui a3, 0xfffff', 'c.lui t0, 1',
      'c.srli a4, 63', 'c.srai a5, 1', 'c.andi s0, -7', 'c.sub s1, a0', 'c.xor a1, a2', 'c.or a3, a4', 'c.and a5, s0', 'c.subw s1, a5', 'c.addw a0, a1',
      'c.slli t1, 33', 'c.fldsp ft2, 504(sp)', 'c.lwsp t3, 252(sp)', 'c.ldsp ra, 8(sp)', 'c.jr t2', 'c.mv t4, t5', 'c.ebreak', 'c.jalr a6', 'c.add s2, s3',
      'c.fsdsp fs0, 0(sp)', 'c.swsp s4, 60(sp)', 'c.sdsp s5, 504(sp)',
    ]
    const src = ['  .text', '  .globl f', '  .type f, @function', 'f:', ...forms.map((f) => `  ${f}`), '1:', '  c.beqz a0, 1b', '  c.bnez s1, 1b', '  c.j 1b', '  .size f, .-f', ''].join('\n')
    const rvc = join(dir, 'rvc.o')
    writeFileSync(join(dir, 'rvc.s'), src)
    run('as', ['-march=rv64gc', join(dir, 'rvc.s'), '-o', rvc])
    const decoded = decodeFunction(readFileSync(rvc), 'f', 1000).instructions
    const lines = run('objdump', ['-d', rvc]).split('\n').map((l) => /^\s*([0-9a-f]+):\s+([0-9a-f]{4})\s+(.*)$/.exec(l)).filter((m) => m !== null)
    expect(lines.length).toBe(forms.length + 3)
    expect(decoded.map((i) => ({ address: i.address, bits: encodeSized(i).bits, text: i.text.replace(/\s+/g, ' ') }))).toEqual(
      lines.map((m) => ({ address: parseInt(m[1] as string, 16), bits: parseInt(m[2] as string, 16), text: normalise(m[3] as string) })),
    )
    // The c. names Chimeline writes back are the ones of the source, and read as the same bits.
    expect(decoded.map((i) => i.compressed)).toEqual([...forms.map((f) => f.split(' ')[0]), 'c.beqz', 'c.bnez', 'c.j'])
    // Chimeline's assembler reads the same source to the same bits at the same addresses.
    const ours = assemble(src)
    if (!ours.ok) throw new Error(ours.errors.map((e) => `${e.line}: ${e.message}`).join('\n'))
    expect(ours.program.instructions.map((i) => ({ address: i.address - ours.program.textBase, ...encodeSized(i) }))).toEqual(decoded.map((i) => ({ address: i.address, ...encodeSized(i) })))
  })

  it('refuses a reserved 16-bit encoding with its address', () => {
    const bad = join(dir, 'bad.o')
    // c.addi16sp with a zero immediate is reserved (RVC listings): the half-word 0x6101.
    writeFileSync(join(dir, 'bad.s'), '  .text\n  .globl f\n  .type f, @function\nf:\n  addi a0, a0, 1\n  .half 0x6101\n  .size f, .-f\n')
    run('as', ['-march=rv64g', join(dir, 'bad.s'), '-o', bad])
    expect(() => decodeFunction(readFileSync(bad), 'f', 1000)).toThrow(/^f\+0x4 \(address 0x4\): 0x6101 is no RV64C instruction/)
  })
})
