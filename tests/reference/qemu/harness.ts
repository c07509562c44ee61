/**
 * Builds the QEMU corpus with GNU binutils and runs it in QEMU user mode
 * (/work/shared/handbook reference check 2): assemble with
 * `riscv64-linux-gnu-as -march=rv64gcv`, link with `riscv64-linux-gnu-ld
 * --no-relax`, run `qemu-riscv64 -cpu rv64,v=true,vlen=N,vext_spec=v1.0`.
 */
import { execFile } from 'node:child_process'
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { basename, join } from 'node:path'
import { promisify } from 'node:util'

const run = promisify(execFile)

export const TOOLS = ['riscv64-linux-gnu-as', 'riscv64-linux-gnu-ld', 'qemu-riscv64'] as const
/** QEMU 7.2 accepts VLEN up to 1024 bits. */
export const VLENS = [128, 256, 1024] as const

export const PROGRAM_DIR = join(import.meta.dirname, 'programs')

export interface CorpusProgram {
  name: string
  path: string
  source: string
}

export function corpus(): CorpusProgram[] {
  return readdirSync(PROGRAM_DIR)
    .filter((f) => f.endsWith('.s'))
    .sort()
    .map((f) => ({ name: basename(f, '.s'), path: join(PROGRAM_DIR, f), source: readFileSync(join(PROGRAM_DIR, f), 'utf8') }))
}

/** Runs `jobs` with at most `limit` at a time, keeping their order. */
export async function pool<T>(jobs: (() => Promise<T>)[], limit: number): Promise<T[]> {
  const results: T[] = new Array(jobs.length)
  let next = 0
  const worker = async (): Promise<void> => {
    while (next < jobs.length) {
      const i = next++
      results[i] = await jobs[i]!()
    }
  }
  await Promise.all(Array.from({ length: Math.min(limit, jobs.length) }, worker))
  return results
}

/** Assembles and links one program into `dir`; returns the executable's path. */
export async function build(p: CorpusProgram, dir: string): Promise<string> {
  const obj = join(dir, `${p.name}.o`)
  const exe = join(dir, p.name)
  await run('riscv64-linux-gnu-as', ['-march=rv64gcv', p.path, '-o', obj])
  await run('riscv64-linux-gnu-ld', ['--no-relax', obj, '-o', exe])
  return exe
}

export interface QemuRun {
  stdout: Buffer
  exitCode: number
}

export async function runQemu(exe: string, vlen: number): Promise<QemuRun> {
  const args = ['-cpu', `rv64,v=true,vlen=${vlen},vext_spec=v1.0`, exe]
  try {
    const { stdout } = await run('qemu-riscv64', args, { encoding: 'buffer', timeout: 20_000 })
    return { stdout, exitCode: 0 }
  } catch (e) {
    const err = e as { code?: number; stdout?: Buffer; signal?: string }
    if (typeof err.code === 'number' && err.stdout) return { stdout: err.stdout, exitCode: err.code }
    throw new Error(`qemu-riscv64 ${args.join(' ')} failed (signal ${err.signal ?? 'none'})`, { cause: e })
  }
}

/** Builds every program once and runs each at every VLEN, a few at a time. */
export async function referenceOutputs(programs: CorpusProgram[]): Promise<Map<string, QemuRun>> {
  const dir = mkdtempSync(join(tmpdir(), 'chimeline-qemu-'))
  try {
    const exes = await pool(programs.map((p) => () => build(p, dir)), 4)
    const jobs = programs.flatMap((p, i) => VLENS.map((vlen) => async () => [`${p.name}@${vlen}`, await runQemu(exes[i]!, vlen)] as const))
    return new Map(await pool(jobs, 4))
  } finally {
    rmSync(dir, { recursive: true, force: true })
  }
}
