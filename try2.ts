import fs from 'node:fs'
import { parseMachine } from './shared/schemas/machine'
import { findPreset } from './shared/sim/presets'
import { runPipeline } from './shared/sim/run'
import { kernelFigures } from './shared/characterise/figures'
const files = process.argv.slice(2)
for (const p of ['default-8', 'wide-16']) for (const f of files) {
  const machine = parseMachine(findPreset(p)!.machine)
  const r = runPipeline({ program: fs.readFileSync(f, 'utf8'), machine })
  if (!r.ok) { console.log(f, r.error); continue }
  const k = kernelFigures(r.trace.metrics, machine)
  console.log(p, f.split('/').pop(), 'cyc', k.cycles, 'flops', k.flops, 'fpc', k.flopsPerCycle.toFixed(2), 'frac', k.fractionOfPeak.toFixed(3), 'B/c', k.bytesPerCycle.toFixed(1), 'busy', k.laneBusyMean.toFixed(2), JSON.stringify(k.topStalls.map(s=>[s.reason, +s.share.toFixed(2)])), k.verdict, 'bus', k.busUtilization.load.toFixed(2), 'fpu', k.unitUtilization.fpu.toFixed(2), 'ring', k.ringUtilization.toFixed(2))
}
