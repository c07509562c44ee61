/**
 * Issue 10, stale names: an edited example is a custom program; exports are
 * named after the scenario's title (else "untitled"), never after the example
 * the text started from; the picture's subtitle says the estimate note once.
 */
import { describe, expect, it } from 'vitest'
import { CUSTOM_PROGRAM, exampleOf, type Example } from '@shared/examples'
import { exportNames } from '@/lib/bench/exports'
import { chartPalette } from '@/lib/lanechart/colours'
import { buildLayout } from '@/lib/lanechart/layout'
import { ESTIMATE_NOTE, exportScene } from '@/lib/lanechart/scene'
import { singleAdd } from './fixtures'

const examples: Example[] = [
  { id: 'long-stream', title: 'Long stream', source: 'vfadd.vv v1, v2, v3\n' },
  { id: 'saxpy', title: 'saxpy', source: 'vfmacc.vf v1, fa0, v2\n' },
]

describe('names that follow what is on the Bench', () => {
  it('the examples menu names an example only while the text is exactly that example', () => {
    expect(exampleOf('vfadd.vv v1, v2, v3\n', examples)?.id).toBe('long-stream')
    expect(exampleOf('vfadd.vv v1, v2, v4\n', examples)).toBeNull()
    expect(CUSTOM_PROGRAM).toBe('Custom program')
  })

  it('exports take the scenario title, lower case with dashes, and "untitled" without one', () => {
    expect(exportNames('Ragged vl=20')).toEqual({ file: 'ragged-vl-20', heading: 'Chimeline: Ragged vl=20' })
    expect(exportNames(null)).toEqual({ file: 'untitled', heading: 'Chimeline: untitled' })
    expect(exportNames('  ')).toEqual({ file: 'untitled', heading: 'Chimeline: untitled' })
    expect(exportNames('../etc/passwd').file).toBe('etc-passwd')
    // An example as shipped keeps its name; an edited one is passed as null (exampleOf) and is untitled.
    expect(exportNames(null, examples[1]!)).toEqual({ file: 'saxpy', heading: 'Chimeline: saxpy' })
    expect(exportNames('Ragged vl=20', examples[0]!).file).toBe('ragged-vl-20')
  })

  it('the exported picture says the estimate note once', () => {
    const trace = singleAdd(16).trace
    const theme = { dark: false, background: '#ffffff', text: '#111111', muted: '#666666', grid: '#dddddd', accent: '#2060c0', stall: '#a3a9b0' }
    const scene = exportScene(trace, buildLayout(trace), { start: 0, end: trace.cycles }, chartPalette(theme), {
      width: 900, legend: true, title: exportNames('Ragged vl=20').heading, summary: '8 lanes, VLEN 16384', fonts: { sans: 'sans-serif', mono: 'monospace' },
    })
    const all = scene.items.filter((i) => i.type === 'text').map((i) => (i as { text: string }).text).join('\n')
    expect(all.split('not sign-off for silicon').length - 1).toBe(1)
    expect(all).toContain(`8 lanes, VLEN 16384 · ${ESTIMATE_NOTE}`)
  })
})
