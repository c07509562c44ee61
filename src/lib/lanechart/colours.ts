/**
 * Colours of the Lane chart from the theme. Instructions take ColorBrewer's
 * qualitative schemes as d3-scale-chromatic ships them: Dark2 on a light
 * background, its lighter twin Set2 on a dark one (the same hues, so a run
 * keeps its colours across themes). The scheme's grey is left out because
 * stalls are grey. ColorBrewer rates the first three classes of these schemes
 * colour-blind safe, so the first three static instructions get those; past
 * the seven hues the cycle repeats darker, then lighter (21 distinct colours,
 * then it wraps). Phases differ by lightness: read is the colour faded toward
 * the background, execute the colour itself, write the colour toward the text.
 *
 * @example
 *   const palette = chartPalette(themeColours)
 *   ctx.fillStyle = palette.keyColour(colourKey(slot + 1, 1))
 */
import { interpolateLab, lab, schemeDark2, schemeSet2 } from 'd3'
import { keyKind, keySlot, MIXED_SLOT } from './lod'

export interface ChartTheme {
  dark: boolean
  background: string
  text: string
  /** Secondary text: lane labels, ruler numbers, merged bars of several instructions. */
  muted: string
  /** Grid lines and lane separators. */
  grid: string
  /** Selection outline and cursor. */
  accent: string
  /** Base grey of stall hatching. */
  stall: string
}

export interface ChartPalette {
  theme: ChartTheme
  /** The base colour of a colour slot of the layout. */
  instructionColour(slot: number): string
  /** The fill of a draw-list key (colour slot and kind). */
  keyColour(key: number): string
}

/**
 * The stall grey of each theme: neutral, a step apart from the theme's text
 * greys so a stall never reads as text. On dark the grey sits low, close to
 * the card, so that the read phase (dark but saturated, see phaseShade) never
 * looks like it: every read shade is at least 25 ΔE*ab from it (tested).
 */
export const STALL_GREY = { light: '#a3a9b0', dark: '#484c52' } as const

/** Hues per round: the scheme without its grey. */
export const HUES = 7
const ROUNDS = 3

/** Round 1 moves away from the background (darker on light), round 2 toward it. */
function shifted(colour: string, round: number, dark: boolean): string {
  if (round === 0) return colour
  const c = lab(colour)
  const away = round === 1 ? -16 : 14
  c.l = Math.max(15, Math.min(92, c.l + (dark ? -away : away)))
  return c.formatHex()
}

export function instructionColour(slot: number, dark: boolean): string {
  if (!Number.isInteger(slot) || slot < 0) throw new RangeError(`colour slot must be a non-negative integer, got ${slot}`)
  const scheme = dark ? schemeSet2 : schemeDark2
  const hue = scheme[slot % HUES]!
  return shifted(hue, Math.floor(slot / HUES) % ROUNDS, dark)
}

/**
 * The shade of `base` for a phase (0 read, 1 execute, 2 write) or a stall (3:
 * the stall grey). On a dark card, fading toward the background also washes
 * out the colour, and the pale Set2 hues turned into a slate like the stall
 * grey; there the read phase takes the lightness 60 % of the way toward the
 * background and 1.4 times the chroma instead: dark, but plainly a colour.
 */
export function phaseShade(base: string, kind: number, theme: ChartTheme): string {
  if (kind === 0 && theme.dark) {
    const c = lab(base)
    const bgL = lab(theme.background).l
    return lab(c.l - 0.6 * (c.l - bgL), c.a * 1.4, c.b * 1.4).formatHex()
  }
  if (kind === 0) return interpolateLab(base, theme.background)(0.5)
  if (kind === 2) return interpolateLab(base, theme.text)(0.35)
  if (kind === 3) return theme.stall
  return lab(base).formatHex()
}

export function chartPalette(theme: ChartTheme): ChartPalette {
  const cache = new Map<number, string>()
  const base = (slot: number) => (slot === MIXED_SLOT ? theme.muted : instructionColour(slot - 1, theme.dark))
  return {
    theme,
    instructionColour: (slot) => instructionColour(slot, theme.dark),
    keyColour(key) {
      let c = cache.get(key)
      if (c === undefined) {
        c = phaseShade(base(keySlot(key)), keyKind(key), theme)
        cache.set(key, c)
      }
      return c
    },
  }
}
