/**
 * Child process of `npm run bench` (run with --expose-gc and
 * --max-old-space-size=256): the 100,000-instruction strip-mined run through
 * the whole pipeline, sampling the heap at every pause between batches of
 * cycles. Prints one JSON object.
 */
import { defaultMachine } from '../../shared/schemas/machine'
import { runPipelineSteps } from '../../shared/sim/run'
import { stripMined } from './programs'

const gc = (globalThis as { gc?: () => void }).gc
if (!gc) throw new Error('run with --expose-gc')
gc()
const base = process.memoryUsage().heapUsed
let peak = base
const sample = () => {
  peak = Math.max(peak, process.memoryUsage().heapUsed)
}
const t0 = performance.now()
const steps = runPipelineSteps({ program: stripMined(100_000), machine: defaultMachine }, { batchCycles: 5_000 })
let result
for (;;) {
  const s = steps.next()
  sample()
  if (s.done) {
    result = s.value
    break
  }
}
const seconds = (performance.now() - t0) / 1000
// A run cut short by a limit still has its partial trace: report it with the error.
const trace = result.ok ? result.trace : result.trace
if (!trace) throw new Error(`${result.ok ? '' : `${result.error.stage}: ${result.error.message}`}`)
gc()
const retained = process.memoryUsage().heapUsed - base
const MiB = 1024 * 1024
console.log(JSON.stringify({
  instructions: trace.instructions.length,
  cycles: trace.cycles,
  ...(result.ok ? {} : { error: `${result.error.code} at cycle ${trace.cycles}` }),
  peakHeapMiB: peak / MiB,
  retainedMiB: retained / MiB,
  seconds,
  // keep the trace alive until after the measurement
  lanes: trace.laneCount,
}))
