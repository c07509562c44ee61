/**
 * Compiler output against QEMU (/work/shared/handbook reference check 6): a
 * corpus of C kernels of our own (tests/reference/kernels/*.c, with the small
 * runtime runtime.h that writes results through the Linux write system call)
 * is compiled by Debian's clang-16 with
 *   --target=riscv64-unknown-elf -march=rv64gcv -O2 -ffreestanding -nostdlib -S
 * and that exact output is assembled and run by Chimeline. The reference is the
 * same source compiled with -fno-addrsig (GNU as 2.40 does not know LLVM's
 * .addrsig), assembled by riscv64-linux-gnu-as, linked by riscv64-linux-gnu-ld
 * --no-relax and run by qemu-riscv64 at VLEN 128, 256 and 1024: Chimeline's
 * output must equal QEMU's byte for byte at each VLEN. The linked executable
 * itself (full of 16-bit RV64C instructions) is imported through the upload's
 * ELF path (the whole program, with its data, from its entry point) and must
 * print the same bytes; its instructions decode to the text `objdump -d`
 * prints, and its objdump listing imports too. Each kernel also runs through
 * the timing model to completion on every preset, and the assembler's and
 * executor's limits hold on compiler output.
 */
import { execFile } from 'node:child_process'
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { basename, join } from 'node:path'
import { promisify } from 'node:util'
import { referenceToolsPresent } from '../tools'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { assemble } from '../../../shared/sim/isa/assembler'
import { decodeAt } from '../../../shared/sim/isa/decoder'
import { executableToAssembly, WHOLE_EXECUTABLE } from '../../../server/services/elf/program'
import { readElf } from '../../../server/services/elf/reader'
import { uploadWork } from '../../../server/services/uploads'
import type { UploadFields } from '../../../shared/schemas/upload'
import { execute } from '../../../shared/sim/exec/execute'
import { PRESETS } from '../../../shared/sim/presets'
import { runPipeline } from '../../../shared/sim/run'
import { pool, runQemu, VLENS } from '../qemu/harness'

const run = promisify(execFile)
const DIR = import.meta.dirname
const KERNELS = readdirSync(DIR).filter((f) => f.endsWith('.c')).sort().map((f) => basename(f, '.c'))
const CLANG = 'clang-16'
const FLAGS = ['--target=riscv64-unknown-elf', '-march=rv64gcv', '-O2', '-ffreestanding', '-nostdlib', '-S']
const TOOLS = [CLANG, 'riscv64-linux-gnu-as', 'riscv64-linux-gnu-ld', 'riscv64-linux-gnu-objdump', 'qemu-riscv64']

const present = referenceToolsPresent('the compiled-kernel reference check', TOOLS, 'clang riscv')

interface Built {
  /** clang's assembly, exactly as written. */
  asm: string
  /** QEMU's standard output by VLEN. */
  qemu: Map<number, Buffer>
  /** The linked executable QEMU ran, and `objdump -d` of it. */
  elf: Buffer
  objdump: string
}

/** A file through the upload's reading (the work-pool task), as the server imports it: the scenario's program text. */
function importedProgram(name: string, buffer: Buffer, fields: UploadFields): string {
  const r = uploadWork({ file: { originalname: name, mimetype: 'application/octet-stream', size: buffer.length, buffer }, fields, mode: 'read' })
  if (!r.ok) throw new Error(`${name}: ${r.message}`)
  const read = (r.value as { read: { content?: { program: string } } }).read
  if (!read.content) throw new Error(`${name}: no scenario content`)
  return read.content.program
}

/** objdump -d text normalised as in tests/reference/binutils (binutils 2.40 prints addi/andi/... with an immediate as add/and/...). */
function normalise(text: string): string {
  const t = text.replace(/#.*$/, '').replace(/\s*<[^>]*>/, '').replace(/\s+/g, ' ').trim()
  return t.replace(/^(add|and|or|xor|sll|srl|sra)(w?) ([a-z0-9]+),([a-z0-9]+),(-?(0x[0-9a-f]+|[0-9]+))$/, (_m, op: string, w: string, rd: string, rs: string, imm: string) => `${op}i${w} ${rd},${rs},${imm}`)
}

describe.skipIf(!present)('C kernels compiled by clang-16: Chimeline runs the compiler output and prints what QEMU prints', () => {
  let dir = ''
  const built = new Map<string, Built>()

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'chimeline-kernels-'))
    await pool(KERNELS.map((k) => async () => {
      const src = join(DIR, `${k}.c`)
      const asmPath = join(dir, `${k}.s`)
      const gasPath = join(dir, `${k}.gas.s`)
      await run(CLANG, [...FLAGS, src, '-o', asmPath])
      await run(CLANG, [...FLAGS, '-fno-addrsig', src, '-o', gasPath])
      await run('riscv64-linux-gnu-as', ['-march=rv64gcv', gasPath, '-o', join(dir, `${k}.o`)])
      await run('riscv64-linux-gnu-ld', ['--no-relax', join(dir, `${k}.o`), '-o', join(dir, k)])
      const qemu = new Map<number, Buffer>()
      for (const vlen of VLENS) {
        const r = await runQemu(join(dir, k), vlen)
        if (r.exitCode !== 0) throw new Error(`${k} exits with ${r.exitCode} under QEMU at VLEN ${vlen}`)
        qemu.set(vlen, r.stdout)
      }
      const { stdout: objdump } = await run('riscv64-linux-gnu-objdump', ['-d', join(dir, k)], { maxBuffer: 1 << 24 })
      built.set(k, { asm: readFileSync(asmPath, 'utf8'), qemu, elf: readFileSync(join(dir, k)), objdump })
    }), 2)
  }, 240_000)
  afterAll(() => {
    if (dir) rmSync(dir, { recursive: true, force: true })
  })

  it('has at least 12 kernels of our own', () => {
    expect(KERNELS.length).toBeGreaterThanOrEqual(12)
  })

  it('compiles to the instructions the issue names (vector loops really were vectorised)', () => {
    const all = [...built.values()].map((b) => b.asm).join('\n')
    for (const op of ['vl1re64.v', 'vs1r.v', 'vwmacc.vv', 'vsext.vf2', 'vzext.vf2', 'vnsrl.wi', 'vfwcvt.f.x.v', 'vfncvt.f.f.w', 'vredsum.vs', 'vlse32.v', 'vsse64.v', 'vmerge.vim', 'fmadd.d', 'addw', 'sext.w', 'csrr']) {
      expect(all, op).toMatch(new RegExp(`\\s${op.replace(/\./g, '\\.')}\\s`))
    }
  })

  const cases = KERNELS.flatMap((k) => VLENS.map((vlen) => ({ k, vlen })))
  it.each(cases)('$k at VLEN $vlen: the exact compiler output prints the same bytes as QEMU', ({ k, vlen }) => {
    const b = built.get(k)!
    const asm = assemble(b.asm)
    if (!asm.ok) throw new Error(asm.errors.slice(0, 5).map((e) => `${e.line}:${e.column} ${e.message}`).join('\n'))
    const r = execute(asm.program, { vlen })
    if (!r.ok) throw new Error(`${r.error.line}:${r.error.column} ${r.error.message}`)
    const want = b.qemu.get(vlen)!
    expect(want.length).toBeGreaterThan(0)
    expect(Buffer.from(r.output).equals(want), `${k}: ${r.output.length} bytes, QEMU ${want.length}`).toBe(true)
    expect(r.ended).toBe('exit')
  })

  it.each(cases)('$k at VLEN $vlen: the linked executable, imported as an ELF file (whole program with its data), prints the same bytes as QEMU', ({ k, vlen }) => {
    const b = built.get(k)!
    const text = importedProgram(`${k}.elf`, b.elf, { kind: 'elf', function: WHOLE_EXECUTABLE })
    const asm = assemble(text)
    if (!asm.ok) throw new Error(asm.errors.slice(0, 5).map((e) => `${e.line}:${e.column} ${e.message}`).join('\n'))
    expect(asm.program.entry).toBe(readElf(b.elf).entry)
    const r = execute(asm.program, { vlen })
    if (!r.ok) throw new Error(`${r.error.line}:${r.error.column} ${r.error.message}`)
    expect(Buffer.from(r.output).equals(b.qemu.get(vlen)!), `${k}: ${r.output.length} bytes, QEMU ${b.qemu.get(vlen)!.length}`).toBe(true)
    expect(r.ended).toBe('exit')
  })

  it.each(KERNELS)('%s: every instruction of the linked executable (RV64C included) decodes to the bits and text objdump -d prints', (k) => {
    const b = built.get(k)!
    const rows = b.objdump.split('\n').map((l) => /^\s*([0-9a-f]+):\s+([0-9a-f]{4}|[0-9a-f]{8})\s+(.*)$/.exec(l)).filter((m) => m !== null)
    const elf = readElf(b.elf)
    const text = elf.sections.find((s) => s.name === '.text')!
    const ours = []
    for (let at = 0; at < text.size;) {
      const d = decodeAt(b.elf, text.offset + at, text.addr + at)
      if (!d.result?.ok) throw new Error(`${k}: no instruction at 0x${(text.addr + at).toString(16)}`)
      ours.push({ address: d.result.instruction.address, size: d.size, text: d.result.instruction.text.replace(/\s+/g, ' ') })
      at += d.size
    }
    expect(rows.some((m) => m[2]!.length === 4), 'the executable has compressed instructions').toBe(true)
    expect(ours).toEqual(rows.map((m) => ({ address: parseInt(m[1]!, 16), size: m[2]!.length / 2, text: normalise(m[3]!) })))
  })

  it.each(KERNELS)('%s: the objdump -d listing of the linked executable imports (16-bit rows included) and assembles back to its bits', (k) => {
    const text = importedProgram(`${k}.txt`, Buffer.from(built.get(k)!.objdump), { kind: 'objdump' })
    expect(text).toMatch(/^ {2}c\.[a-z]/m)
    expect(assemble(text).ok).toBe(true)
  })

  it.each(PRESETS.map((p) => ({ preset: p.id, machine: p.machine })))('every kernel times to completion on preset $preset', ({ machine }) => {
    for (const k of KERNELS) {
      const r = runPipeline({ program: built.get(k)!.asm, machine })
      expect(r.ok ? 'ok' : `${k}: ${r.error.stage} ${r.error.message}`).toBe('ok')
      if (r.ok) expect(r.trace.cycles).toBeGreaterThan(0)
    }
  }, 120_000)

  it.each([['compiled-daxpy', 'daxpy'], ['compiled-fir', 'fir']])('examples/%s.s is the compiler output of %s.c, unchanged below its header', (example, k) => {
    const text = readFileSync(join(DIR, '../../../examples', `${example}.s`), 'utf8')
    expect(text.replace(/^(#[^\n]*\n)+/, '')).toBe(built.get(k)!.asm)
  })

  it('keeps the limits on compiler output: instructions, data and steps (each named with where)', () => {
    const text = built.get('daxpy')!.asm
    const full = assemble(text)
    if (!full.ok) throw new Error('daxpy does not assemble')
    const n = full.program.instructions.length
    const fewer = assemble(text, { maxInstructions: n - 1 })
    expect(!fewer.ok && fewer.errors[0]).toMatchObject({ code: 'too-many-instructions', message: `more than ${n - 1} instructions (after expanding pseudo-instructions)` })
    const smallData = assemble(text, { maxDataBytes: 1024 })
    expect(!smallData.ok && smallData.errors[0]?.code).toBe('data-too-large')
    const steps = execute(full.program, { vlen: 128, stepLimit: 1000 })
    expect(!steps.ok && steps.error).toMatchObject({ code: 'step-limit' })
    expect(!steps.ok && steps.error.line).toBeGreaterThan(0)
  })

  it('keeps the limits on a linked executable: instructions and data span at import, steps when it runs', async () => {
    const elf = readElf(built.get('daxpy')!.elf)
    expect(() => executableToAssembly(elf, 'daxpy', 10)).toThrow('.text has more than 10 instructions; the limit is 10')
    // The same object linked with .bss 32 MiB above .sdata (ld -Tbss): the data span exceeds the 16 MiB data limit.
    const far = join(dir, 'daxpy-far')
    await run('riscv64-linux-gnu-ld', ['--no-relax', '-Tbss=0x2100000', join(dir, 'daxpy.o'), '-o', far])
    expect(() => executableToAssembly(readElf(readFileSync(far)), 'daxpy-far', 1000)).toThrow(/^the data spans \d+ bytes \(0x[0-9a-f]+\.\.0x[0-9a-f]+\); the limit is 16777216$/)
    const text = importedProgram('daxpy.elf', built.get('daxpy')!.elf, { kind: 'elf', function: WHOLE_EXECUTABLE })
    const program = assemble(text)
    if (!program.ok) throw new Error('the import does not assemble')
    const steps = execute(program.program, { vlen: 128, stepLimit: 1000 })
    expect(!steps.ok && steps.error).toMatchObject({ code: 'step-limit' })
    expect(!steps.ok && steps.error.line).toBeGreaterThan(0)
  })
})
