/**
 * `npm run bench`: the two targets of issue 4 ("Speed and memory"), printed
 * as a table.
 *   1. Simulated lane-cycles per second in one Node thread on the
 *      1,000-instruction long stream (examples/long-stream.s) at vl = 256 on
 *      8 lanes (the default machine); target >= 10 million. The timing stage is
 *      timed alone (median of several runs after a warm-up), and the whole
 *      pipeline (assemble + execute + simulate) for comparison.
 *   2. Peak heap of a 100,000-instruction strip-mined run; target <= 256 MiB.
 *      Measured in a child process started with --expose-gc and
 *      --max-old-space-size=256, so that exceeding the target is also a crash.
 */
import { spawnSync } from 'node:child_process'
import { fileURLToPath } from 'node:url'
import { defaultMachine } from '../../shared/schemas/machine'
import { assemble } from '../../shared/sim/isa/assembler'
import { execute } from '../../shared/sim/exec/execute'
import { runPipeline } from '../../shared/sim/run'
import { simulate } from '../../shared/sim/timing/simulate'
import { longStream } from './programs'

const RUNS = 7
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!

function speed() {
  const machine = defaultMachine
  const asm = assemble(longStream())
  if (!asm.ok) throw new Error(`long-stream.s: ${asm.errors[0]?.message}`)
  const run = execute(asm.program, { vlen: machine.vlen })
  if (!run.ok) throw new Error(`long-stream.s: ${run.error.message}`)
  const ops = run.stream.ops.filter((o) => !o.isConfig)
  const vl = Math.max(...ops.map((o) => o.vl))
  const timing: number[] = []
  let cycles = 0
  for (let i = 0; i < RUNS + 2; i++) {
    const t0 = performance.now()
    const r = simulate(run.stream, machine)
    const ms = performance.now() - t0
    if (r.error) throw new Error(`long-stream.s: ${r.error.message}`)
    cycles = r.trace.cycles
    if (i >= 2) timing.push(ms)
  }
  const pipeline: number[] = []
  for (let i = 0; i < 3; i++) {
    const t0 = performance.now()
    const r = runPipeline({ program: longStream(), machine })
    if (!r.ok) throw new Error(r.error.message)
    pipeline.push(performance.now() - t0)
  }
  const laneCycles = cycles * machine.lanes
  return { instructions: run.stream.ops.length, vl, lanes: machine.lanes, cycles, laneCycles, timingMs: median(timing), pipelineMs: median(pipeline) }
}

interface HeapFigures { instructions: number; cycles: number; peakHeapMiB: number; retainedMiB: number; seconds: number; error?: string }

function heapRun(limitMiB: number): HeapFigures | { failed: string } {
  const script = fileURLToPath(new URL('./heap.ts', import.meta.url))
  const child = spawnSync(process.execPath, ['--expose-gc', `--max-old-space-size=${limitMiB}`, '--import', 'tsx', script], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 })
  if (child.status === 0) return JSON.parse(child.stdout) as HeapFigures
  const oom = /heap out of memory|Allocation failed/.test(child.stderr)
  return { failed: oom ? `out of memory under a ${limitMiB} MiB heap` : `exit ${child.status ?? child.signal}: ${child.stderr.trim().split('\n').pop()}` }
}

/** Under the target's limit; when that fails, once more with room to spare, to report the real peak. */
function heap(): { within: HeapFigures | { failed: string }; unbounded?: HeapFigures | { failed: string } } {
  const within = heapRun(256)
  return 'failed' in within ? { within, unbounded: heapRun(4096) } : { within }
}

const fmt = (n: number, digits = 1) => n.toLocaleString('en-US', { maximumFractionDigits: digits })

const s = speed()
const rate = s.laneCycles / (s.timingMs / 1000)
const rows: string[][] = [
  ['measure', 'workload', 'result', 'target', 'met'],
  ['lane-cycles/s, timing only', `${s.instructions} instructions, vl ${s.vl}, ${s.lanes} lanes, ${fmt(s.cycles, 0)} cycles`, `${fmt(rate / 1e6)} M (${fmt(s.timingMs)} ms)`, '>= 10 M', rate >= 10e6 ? 'yes' : 'no'],
  ['lane-cycles/s, whole pipeline', 'same, with assemble and execute', `${fmt(s.laneCycles / (s.pipelineMs / 1000) / 1e6)} M (${fmt(s.pipelineMs)} ms)`, '', ''],
]
const heapRow = (h: HeapFigures | { failed: string }, label: string, judge: boolean) =>
  'failed' in h
    ? ['peak heap' + label, '100,000-instruction strip-mined run', h.failed, '<= 256 MiB', 'no']
    : ['peak heap' + label, `${fmt(h.instructions, 0)} instructions, ${fmt(h.cycles, 0)} cycles, ${fmt(h.seconds)} s${h.error ? ` (${h.error})` : ''}`,
        `${fmt(h.peakHeapMiB)} MiB (retained after the run ${fmt(h.retainedMiB)} MiB)`, judge ? '<= 256 MiB' : '', judge ? (h.peakHeapMiB <= 256 ? 'yes' : 'no') : '']
const h = heap()
rows.push(heapRow(h.within, '', true))
if (h.unbounded) rows.push(heapRow(h.unbounded, ', 4 GiB allowed', false))
const widths = rows[0]!.map((_, c) => Math.max(...rows.map((r) => r[c]!.length)))
for (const [i, r] of rows.entries()) {
  console.log(r.map((cell, c) => cell.padEnd(widths[c]!)).join('  '))
  if (i === 0) console.log(widths.map((w) => '-'.repeat(w)).join('  '))
}
