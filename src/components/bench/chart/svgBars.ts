/**
 * The SVG renderer for small runs: one <g> per bar group carrying
 * data-lane and data-instruction (so that tests and assistive tools can find
 * every group), one <rect> per bar, stalls with a hatch overlay. Stall rects
 * take no pointer events: a strip lies on a phase bar (layout.ts), and the
 * chart hit-tests by position anyway, so the rect under a click is the phase
 * bar's (what a user and a test aim at). Every call
 * re-joins the data (d3's general update pattern); small runs keep this well
 * within a frame.
 */
import { select } from 'd3'
import type { ChartPalette } from '@/lib/lanechart/colours'
import { barBox, STALL_KIND, type ChartLayout } from '@/lib/lanechart/layout'
import { colourKey } from '@/lib/lanechart/lod'
import type { CycleScale } from '@/lib/lanechart/window'

export interface SvgBarsState {
  layout: ChartLayout
  scale: CycleScale
  palette: ChartPalette
  /** Instruction indices (InstructionTrace.index) by position. */
  indexOf: (position: number) => number
  /** Selected instruction position, or null. */
  selected: number | null
  hatchId: string
}

interface Piece {
  bar: number
  hatch: boolean
}

export function renderSvgBars(root: SVGGElement, s: SvgBarsState): void {
  const { layout, scale, palette } = s
  const { bars, groups } = layout
  const inset = layout.trackHeight > 6 ? 1 : 0.5
  const groupIds = Array.from({ length: groups.count }, (_, g) => g)
  select(root)
    .selectAll<SVGGElement, number>('g.lc-group')
    .data(groupIds, (g) => String(g))
    .join('g')
    .attr('class', (g) => (s.selected !== null && groups.instruction[g] === s.selected ? 'lc-group lc-selected' : 'lc-group'))
    .attr('data-lane', (g) => groups.lane[g]!)
    .attr('data-instruction', (g) => s.indexOf(groups.instruction[g]!))
    .attr('opacity', (g) => (s.selected === null || groups.instruction[g] === s.selected ? 1 : 0.25))
    .selectAll<SVGRectElement, Piece>('rect')
    .data((g) => {
      const out: Piece[] = []
      for (let b = groups.firstBar[g]!; b < groups.firstBar[g + 1]!; b++) {
        out.push({ bar: b, hatch: false })
        if (bars.kind[b] === STALL_KIND) out.push({ bar: b, hatch: true })
      }
      // Phases under stalls, as on the canvas.
      return out.sort((a, b) => Number(bars.kind[a.bar] === STALL_KIND) - Number(bars.kind[b.bar] === STALL_KIND) || Number(a.hatch) - Number(b.hatch))
    })
    .join('rect')
    .attr('class', (p) => (bars.kind[p.bar] !== STALL_KIND ? 'lc-phase' : `lc-stall${bars.strip[p.bar] ? ' lc-strip' : ''}${p.hatch ? ' lc-hatch' : ''}`))
    .attr('x', (p) => scale.toPx(bars.start[p.bar]!))
    .attr('width', (p) => Math.max(1, scale.toPx(bars.end[p.bar]!) - scale.toPx(bars.start[p.bar]!)))
    .attr('y', (p) => barBox(layout, p.bar).y + inset)
    .attr('height', (p) => Math.max(1, barBox(layout, p.bar).h - 2 * inset))
    .attr('fill', (p) => {
      if (p.hatch) return `url(#${s.hatchId})`
      const slot = layout.colourOf[groups.instruction[bars.group[p.bar]!]!]! + 1
      return palette.keyColour(colourKey(slot, bars.kind[p.bar]!))
    })
}
