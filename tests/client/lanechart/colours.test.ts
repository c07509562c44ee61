import { describe, expect, it } from 'vitest'
import { lab } from 'd3'
import { chartPalette, HUES, instructionColour, phaseShade, STALL_GREY, type ChartTheme } from '@/lib/lanechart/colours'
import { colourKey, MIXED_SLOT } from '@/lib/lanechart/lod'

const light: ChartTheme = { dark: false, background: '#ffffff', text: '#1f2225', muted: '#767c82', grid: '#e0e0e6', accent: '#2c63a8', stall: '#9aa0a6' }
const dark: ChartTheme = { ...light, dark: true, background: '#18181c', text: '#e8e8ea' }

describe('chart colours', () => {
  // ColorBrewer Dark2 and Set2, eight classes (colorbrewer2.org, as d3-scale-chromatic ships them), from memory.
  it.each([
    [false, ['#1b9e77', '#d95f02', '#7570b3']],
    [true, ['#66c2a5', '#fc8d62', '#8da0cb']],
  ])('the first three instructions take the colour-blind-safe classes of the scheme (dark theme: %s)', (isDark, expected) => {
    expect([0, 1, 2].map((s) => instructionColour(s, isDark))).toEqual(expected)
  })

  it('leaves the scheme grey out, since grey means a stall', () => {
    const colours = Array.from({ length: HUES }, (_, s) => instructionColour(s, false))
    expect(colours).not.toContain('#666666')
    expect(HUES).toBe(7)
  })

  it.each([false, true])('gives 21 distinct colours before repeating (dark theme: %s)', (isDark) => {
    const colours = Array.from({ length: 21 }, (_, s) => instructionColour(s, isDark))
    expect(new Set(colours).size).toBe(21)
    expect(instructionColour(21, isDark)).toBe(colours[0])
  })

  it.each([
    [light, 'lighter'],
    [dark, 'darker'],
  ] as const)('shows the read phase faded toward the background ($1 than execute)', (theme, direction) => {
    const base = instructionColour(0, theme.dark)
    const read = lab(phaseShade(base, 0, theme)).l
    const exec = lab(phaseShade(base, 1, theme)).l
    expect(direction === 'lighter' ? read > exec : read < exec).toBe(true)
  })

  it('gives the three phases and a stall four different fills', () => {
    const palette = chartPalette(light)
    const fills = [0, 1, 2, 3].map((kind) => palette.keyColour(colourKey(1, kind)))
    expect(new Set(fills).size).toBe(4)
    expect(fills[3]).toBe(light.stall)
  })

  it('paints bars merged from several instructions in the muted theme colour', () => {
    expect(chartPalette(light).keyColour(colourKey(MIXED_SLOT, 1))).toBe(lab(light.muted).formatHex())
  })

  // CIE 1976 ΔE*ab, the Euclidean distance in CIELAB; about 2.3 is a just noticeable difference
  // (Sharma, Digital Color Imaging Handbook, from memory). 25 is our bar for "plainly different".
  const deltaE = (a: string, b: string) => {
    const x = lab(a)
    const y = lab(b)
    return Math.hypot(x.l - y.l, x.a - y.a, x.b - y.b)
  }

  it('dark theme: every read phase stays plainly apart from the stall grey and from its execute colour (issue 10)', () => {
    // The app's dark card (Naive UI's dark neutralCard) and stall grey.
    const appDark: ChartTheme = { ...dark, background: 'rgb(24, 24, 28)', stall: STALL_GREY.dark }
    for (let slot = 0; slot < 21; slot++) {
      const base = instructionColour(slot, true)
      const read = phaseShade(base, 0, appDark)
      expect(deltaE(read, STALL_GREY.dark), `slot ${slot} read vs stall`).toBeGreaterThanOrEqual(25)
      expect(deltaE(read, phaseShade(base, 1, appDark)), `slot ${slot} read vs execute`).toBeGreaterThanOrEqual(25)
      expect(deltaE(phaseShade(base, 2, appDark), STALL_GREY.dark), `slot ${slot} write vs stall`).toBeGreaterThanOrEqual(25)
    }
  })

  it('refuses a negative colour slot', () => {
    expect(() => instructionColour(-1, false)).toThrow(/non-negative integer/)
  })
})
