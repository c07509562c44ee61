/**
 * The exported picture of the Lane chart as a value: a list of rectangles,
 * lines and texts in pixels (title, machine summary, cycle ruler, lane
 * labels, the bars of the window with level of detail, the cursor, a legend).
 * `sceneToSvg` writes it as a standalone SVG (colours inline, fonts named);
 * the component paints the same scene on a canvas for the PNG, so both
 * exports show the same thing.
 *
 * @example
 *   const scene = exportScene(trace, layout, window, palette, { width: 1200, title: 'saxpy', summary: '8 lanes', legend: true, fonts })
 *   const svg = sceneToSvg(scene)
 */
import type { TimingTrace } from '@shared/sim/trace/types'
import type { ChartPalette } from './colours'
import { PHASES, STALL_KIND, type ChartLayout } from './layout'
import { colourKey, drawList, keyKind } from './lod'
import { cycleTicks } from './ruler'
import { cycleScale, type CycleWindow } from './window'

export interface SceneRect {
  type: 'rect'
  x: number
  y: number
  w: number
  h: number
  fill: string
  /** Stall hatching drawn over the fill. */
  hatch?: boolean
  stroke?: string
}

export interface SceneLine {
  type: 'line'
  x1: number
  y1: number
  x2: number
  y2: number
  stroke: string
  width: number
}

export interface SceneText {
  type: 'text'
  x: number
  y: number
  text: string
  size: number
  font: 'sans' | 'mono'
  fill: string
  weight?: number
  anchor?: 'start' | 'middle' | 'end'
}

export type SceneItem = SceneRect | SceneLine | SceneText

export interface Scene {
  width: number
  height: number
  background: string
  fonts: { sans: string; mono: string }
  /** Colour of the hatching lines over stalls. */
  hatch: string
  items: SceneItem[]
}

export interface ExportOptions {
  /** Width of the whole picture in pixels. */
  width: number
  title: string
  /** The machine summary line, e.g. "8 lanes, VLEN 16384, staggered, 5x1 banks". */
  summary: string
  legend: boolean
  fonts: { sans: string; mono: string }
  cursor?: number | null
  /** At most this many instruction entries in the legend (default 16); the rest are counted. */
  legendEntries?: number
}

export const ESTIMATE_NOTE = 'Model estimates, not sign-off for silicon'

const PAD = 16
const LABEL_WIDTH = 72
const RULER = 22

export function exportScene(trace: TimingTrace, layout: ChartLayout, window: CycleWindow, palette: ChartPalette, options: ExportOptions): Scene {
  const { theme } = palette
  const plotWidth = options.width - 2 * PAD - LABEL_WIDTH
  if (!(plotWidth > 40)) throw new RangeError(`export width must be more than ${2 * PAD + LABEL_WIDTH + 40} pixels, got ${options.width}`)
  const scale = cycleScale(window, plotWidth)
  const items: SceneItem[] = []
  const text = (x: number, y: number, t: string, size: number, font: 'sans' | 'mono', fill: string, extra: Partial<SceneText> = {}) =>
    items.push({ type: 'text', x, y, text: t, size, font, fill, ...extra })

  let y = PAD + 14
  text(PAD, y, options.title, 15, 'sans', theme.text, { weight: 600 })
  y += 18
  text(PAD, y, options.summary ? `${options.summary} · ${ESTIMATE_NOTE}` : ESTIMATE_NOTE, 12, 'sans', theme.muted)
  y += 12
  const plotX = PAD + LABEL_WIDTH
  const rulerY = y + RULER
  const plotY = rulerY + 4

  // Ruler: a baseline, a tick per label, cycle numbers in the mono face.
  items.push({ type: 'line', x1: plotX, y1: rulerY, x2: plotX + plotWidth, y2: rulerY, stroke: theme.grid, width: 1 })
  for (const tick of cycleTicks(scale)) {
    items.push({ type: 'line', x1: plotX + tick.x, y1: rulerY - 4, x2: plotX + tick.x, y2: plotY + layout.height, stroke: theme.grid, width: 0.5 })
    text(plotX + tick.x, rulerY - 7, tick.label, 11, 'mono', theme.muted, { anchor: tick.anchor })
  }

  for (const row of layout.rows) {
    const label = row.phase === null ? `lane ${row.lane}` : row.phase === 'read' ? `lane ${row.lane} ${row.phase}` : row.phase
    text(plotX - 8, plotY + row.y + Math.min(row.height, 14) / 2 + 4, label, 11, row.phase === null || row.phase === 'read' ? 'sans' : 'mono', theme.muted, { anchor: 'end' })
  }

  const list = drawList(layout, scale)
  for (let r = 0; r < list.count; r++) {
    const x0 = Math.max(0, list.x[r]!)
    const x1 = Math.min(plotWidth, list.x[r]! + list.w[r]!)
    if (x1 <= x0) continue
    const stall = keyKind(list.key[r]!) === STALL_KIND
    items.push({ type: 'rect', x: plotX + x0, y: plotY + list.y[r]! + 0.5, w: x1 - x0, h: list.h[r]! - 1, fill: palette.keyColour(list.key[r]!), ...(stall ? { hatch: true } : {}) })
  }

  const cursor = options.cursor
  if (cursor !== null && cursor !== undefined && cursor >= window.start && cursor < window.end) {
    const cx = plotX + scale.toPx(cursor + 0.5)
    items.push({ type: 'line', x1: cx, y1: rulerY - 4, x2: cx, y2: plotY + layout.height, stroke: theme.accent, width: 1.5 })
  }

  y = plotY + layout.height + 20
  if (options.legend) {
    const swatch = (x: number, yy: number, fill: string, label: string, hatch = false) => {
      items.push({ type: 'rect', x, y: yy - 9, w: 12, h: 10, fill, ...(hatch ? { hatch: true } : {}) })
      text(x + 18, yy, label, 11, 'sans', theme.text)
    }
    // Phases, shown on the first colour, and the stall hatching.
    PHASES.forEach((phase, k) => swatch(PAD + k * 110, y, palette.keyColour(colourKey(1, k)), phase))
    swatch(PAD + 330, y, theme.stall, 'stall', true)
    y += 20
    const max = options.legendEntries ?? 16
    const columns = Math.max(1, Math.floor((options.width - 2 * PAD) / 260))
    const shown = Math.min(max, layout.colourInstruction.length)
    for (let s = 0; s < shown; s++) {
      const ins = trace.instructions[layout.colourInstruction[s]!]
      const col = s % columns
      if (s > 0 && col === 0) y += 18
      items.push({ type: 'rect', x: PAD + col * 260, y: y - 9, w: 12, h: 10, fill: palette.instructionColour(s) })
      text(PAD + col * 260 + 18, y, ins?.text ?? '', 11, 'mono', theme.text)
    }
    if (layout.colourInstruction.length > shown) {
      y += 18
      text(PAD, y, `and ${layout.colourInstruction.length - shown} more instructions`, 11, 'sans', theme.muted)
    }
    y += 16
  }

  return { width: options.width, height: Math.ceil(y + PAD / 2), background: theme.background, fonts: options.fonts, hatch: theme.muted, items }
}

function esc(s: string): string {
  return s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;')
}

const n = (v: number) => String(Math.round(v * 100) / 100)

/** The scene as a standalone SVG document. */
export function sceneToSvg(scene: Scene): string {
  const out: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${scene.width}" height="${scene.height}" viewBox="0 0 ${scene.width} ${scene.height}">`,
    `<defs><pattern id="stall-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="6" height="6" fill="none"/><line x1="0" y1="0" x2="0" y2="6" stroke="${esc(scene.hatch)}" stroke-width="2"/></pattern></defs>`,
    `<rect width="100%" height="100%" fill="${esc(scene.background)}"/>`,
  ]
  for (const it of scene.items) {
    if (it.type === 'rect') {
      const geometry = `x="${n(it.x)}" y="${n(it.y)}" width="${n(it.w)}" height="${n(it.h)}"`
      out.push(`<rect ${geometry} fill="${esc(it.fill)}"${it.stroke ? ` stroke="${esc(it.stroke)}"` : ''}/>`)
      if (it.hatch) out.push(`<rect ${geometry} fill="url(#stall-hatch)"/>`)
    } else if (it.type === 'line') {
      out.push(`<line x1="${n(it.x1)}" y1="${n(it.y1)}" x2="${n(it.x2)}" y2="${n(it.y2)}" stroke="${esc(it.stroke)}" stroke-width="${it.width}"/>`)
    } else {
      const font = esc(it.font === 'mono' ? scene.fonts.mono : scene.fonts.sans)
      const anchor = it.anchor && it.anchor !== 'start' ? ` text-anchor="${it.anchor}"` : ''
      const weight = it.weight ? ` font-weight="${it.weight}"` : ''
      out.push(`<text x="${n(it.x)}" y="${n(it.y)}" font-family="${font}" font-size="${it.size}" fill="${esc(it.fill)}"${anchor}${weight}>${esc(it.text)}</text>`)
    }
  }
  out.push('</svg>')
  return out.join('\n')
}
