/**
 * Painting on a 2D canvas: the bars of a draw list (batched by fill, one
 * path per colour), the stall hatching, and a whole export scene for the PNG.
 */
import type { ChartPalette } from '@/lib/lanechart/colours'
import type { DrawList } from '@/lib/lanechart/lod'
import { keyKind } from '@/lib/lanechart/lod'
import type { Scene } from '@/lib/lanechart/scene'

const STALL = 3
const patterns = new WeakMap<CanvasRenderingContext2D, { colour: string; pattern: CanvasPattern | null }>()

/** Diagonal stripes in `colour`, 6 px apart, as the SVG export draws them. */
export function hatchPattern(ctx: CanvasRenderingContext2D, colour: string): CanvasPattern | null {
  const cached = patterns.get(ctx)
  if (cached && cached.colour === colour) return cached.pattern
  const tile = document.createElement('canvas')
  tile.width = 6
  tile.height = 6
  const t = tile.getContext('2d')
  if (!t) return null
  t.strokeStyle = colour
  t.lineWidth = 1.5
  t.beginPath()
  // Two segments so that the stripes join across tile edges.
  t.moveTo(0, 6)
  t.lineTo(6, 0)
  t.moveTo(-1, 1)
  t.lineTo(1, -1)
  t.moveTo(5, 7)
  t.lineTo(7, 5)
  t.stroke()
  const pattern = ctx.createPattern(tile, 'repeat')
  patterns.set(ctx, { colour, pattern })
  return pattern
}

export interface PaintBarsOptions {
  /** Alpha of every bar (the dimming of a selection), default 1. */
  alpha?: number
  /** Clip bars to [0, width). */
  width: number
  /** Pixels left free at the top and bottom of each bar (default 0.5). */
  inset?: number
}

/** Paints the rectangles of a draw list, one fill at a time, then hatches the stalls. */
export function paintBars(ctx: CanvasRenderingContext2D, list: DrawList, palette: ChartPalette, options: PaintBarsOptions): void {
  const inset = options.inset ?? 0.5
  const byKey = new Map<number, number[]>()
  for (let r = 0; r < list.count; r++) {
    const key = list.key[r]!
    let rs = byKey.get(key)
    if (!rs) byKey.set(key, (rs = []))
    rs.push(r)
  }
  ctx.save()
  ctx.globalAlpha = options.alpha ?? 1
  const stalls: number[] = []
  // Stall fills after every phase fill: a strip lies on a phase bar.
  const keys = [...byKey.keys()].sort((a, b) => Number(keyKind(a) === STALL) - Number(keyKind(b) === STALL))
  for (const key of keys) {
    const rs = byKey.get(key)!
    ctx.fillStyle = palette.keyColour(key)
    ctx.beginPath()
    for (const r of rs) {
      const x0 = Math.max(0, list.x[r]!)
      const x1 = Math.min(options.width, list.x[r]! + list.w[r]!)
      if (x1 > x0) ctx.rect(x0, list.y[r]! + inset, x1 - x0, Math.max(1, list.h[r]! - 2 * inset))
    }
    ctx.fill()
    if (keyKind(key) === STALL) stalls.push(...rs)
  }
  const hatch = hatchPattern(ctx, palette.theme.background)
  if (hatch && stalls.length) {
    ctx.fillStyle = hatch
    ctx.beginPath()
    for (const r of stalls) {
      const x0 = Math.max(0, list.x[r]!)
      const x1 = Math.min(options.width, list.x[r]! + list.w[r]!)
      if (x1 > x0) ctx.rect(x0, list.y[r]! + inset, x1 - x0, Math.max(1, list.h[r]! - 2 * inset))
    }
    ctx.fill()
  }
  ctx.restore()
}

/** Paints an export scene (see scene.ts) at `scale` device pixels per scene pixel. */
export function paintScene(ctx: CanvasRenderingContext2D, scene: Scene, scale: number): void {
  ctx.save()
  ctx.scale(scale, scale)
  ctx.fillStyle = scene.background
  ctx.fillRect(0, 0, scene.width, scene.height)
  const hatch = hatchPattern(ctx, scene.hatch)
  for (const it of scene.items) {
    if (it.type === 'rect') {
      ctx.fillStyle = it.fill
      ctx.fillRect(it.x, it.y, it.w, it.h)
      if (it.hatch && hatch) {
        ctx.fillStyle = hatch
        ctx.fillRect(it.x, it.y, it.w, it.h)
      }
    } else if (it.type === 'line') {
      ctx.strokeStyle = it.stroke
      ctx.lineWidth = it.width
      ctx.beginPath()
      ctx.moveTo(it.x1, it.y1)
      ctx.lineTo(it.x2, it.y2)
      ctx.stroke()
    } else {
      ctx.fillStyle = it.fill
      ctx.font = `${it.weight ?? 400} ${it.size}px ${it.font === 'mono' ? scene.fonts.mono : scene.fonts.sans}`
      ctx.textAlign = it.anchor === 'middle' ? 'center' : it.anchor === 'end' ? 'right' : 'left'
      ctx.textBaseline = 'alphabetic'
      ctx.fillText(it.text, it.x, it.y)
    }
  }
  ctx.restore()
}
