// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest'
import { chartPalette, type ChartTheme } from '@/lib/lanechart/colours'
import { buildLayout } from '@/lib/lanechart/layout'
import { ESTIMATE_NOTE, exportScene, sceneToSvg } from '@/lib/lanechart/scene'
import { twoLaneTrace } from './buildTrace'

const theme: ChartTheme = { dark: false, background: '#ffffff', text: '#1f2225', muted: '#767c82', grid: '#e0e0e6', accent: '#2c63a8', stall: '#9aa0a6' }
const fonts = { sans: "'IBM Plex Sans', sans-serif", mono: "'IBM Plex Mono', monospace" }

function svgOf(options: Partial<Parameters<typeof exportScene>[4]> = {}) {
  const trace = twoLaneTrace()
  const layout = buildLayout(trace)
  const scene = exportScene(trace, layout, { start: 0, end: 20 }, chartPalette(theme), { width: 900, title: 'Two <lanes> & more', summary: '2 lanes, VLEN 8192', legend: true, fonts, cursor: 5, ...options })
  return new DOMParser().parseFromString(sceneToSvg(scene), 'image/svg+xml')
}

describe('exported picture', () => {
  it('is a well-formed standalone SVG with the title, the machine summary and the estimate note', () => {
    const doc = svgOf()
    const svg = doc.documentElement
    expect(svg.tagName.toLowerCase()).toBe('svg')
    expect(svg.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg')
    const texts = Array.from(doc.querySelectorAll('text'), (t) => t.textContent)
    expect(texts[0]).toBe('Two <lanes> & more')
    expect(texts[1]).toBe(`2 lanes, VLEN 8192 · ${ESTIMATE_NOTE}`)
  })

  it('names the fonts and inlines the colours', () => {
    const doc = svgOf()
    const families = new Set(Array.from(doc.querySelectorAll('text'), (t) => t.getAttribute('font-family')))
    expect(families).toEqual(new Set([fonts.sans, fonts.mono]))
    for (const rect of Array.from(doc.querySelectorAll('rect'))) expect(rect.getAttribute('fill')).toMatch(/^(#[0-9a-f]{6}|rgb\(.+\)|url\(#stall-hatch\)|none)$/)
  })

  it('has a legend naming each static instruction, the phases and the stall hatching', () => {
    const texts = Array.from(svgOf().querySelectorAll('text'), (t) => t.textContent)
    for (const label of ['read', 'execute', 'write', 'stall', 'vfadd.vv v8, v8, v16', 'vfmacc.vf v16, fa0, v8']) {
      expect(texts).toContain(label)
    }
    // The vsetvli has no bars, so it takes no colour and no legend entry.
    expect(texts).not.toContain('vsetvli t0, a0, e64, m1, ta, ma')
    expect(Array.from(svgOf({ legend: false }).querySelectorAll('text'), (t) => t.textContent)).not.toContain('read')
  })

  it('draws the stalls with the hatch pattern over the grey', () => {
    expect(svgOf().querySelectorAll('rect[fill="url(#stall-hatch)"]').length).toBe(2 + 1) // two stalls and the legend swatch
  })

  it('refuses a picture too narrow to hold the plot', () => {
    const trace = twoLaneTrace()
    expect(() => exportScene(trace, buildLayout(trace), { start: 0, end: 20 }, chartPalette(theme), { width: 100, title: '', summary: '', legend: false, fonts })).toThrow(/export width/)
  })
})
