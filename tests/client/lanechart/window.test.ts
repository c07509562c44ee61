import { describe, expect, it } from 'vitest'
import { scaleLinear, zoomIdentity } from 'd3'
import { clampWindow, cycleScale, fitWindow, panWindow, sameWindow, transformToWindow, windowToTransform, zoomWindow } from '@/lib/lanechart/window'

const bounds = { cycles: 120 }

describe('cycle window', () => {
  it.each([
    [120, { start: 0, end: 120 }],
    [0, { start: 0, end: 1 }],
  ])('fitting a run of %i cycles shows all of it (an empty run still gets one cycle)', (cycles, expected) => {
    expect(fitWindow(cycles)).toEqual(expected)
  })

  it.each([
    { w: { start: -10, end: 30 }, expected: { start: 0, end: 40 }, why: 'a window before cycle 0 slides right' },
    { w: { start: 100, end: 140 }, expected: { start: 80, end: 120 }, why: 'a window past the end slides left' },
    { w: { start: 50, end: 51 }, expected: { start: 50, end: 54 }, why: 'a window narrower than 4 cycles widens' },
    { w: { start: -50, end: 500 }, expected: { start: 0, end: 120 }, why: 'a window wider than the run becomes the run' },
  ])('clamping: $why', ({ w, expected }) => {
    expect(clampWindow(w, bounds)).toEqual(expected)
  })

  it.each([
    [2, 60],
    [2, 10],
    [4, 100],
    [0.5, 60],
  ])('zooming by %f about cycle %i keeps that cycle at the same place on screen', (factor, anchor) => {
    const w = { start: 20, end: 100 }
    const z = zoomWindow(w, factor, anchor, bounds)
    const before = (anchor - w.start) / (w.end - w.start)
    const after = (anchor - z.start) / (z.end - z.start)
    expect(after).toBeCloseTo(before, 9)
    expect(z.end - z.start).toBeCloseTo(Math.min(120, (w.end - w.start) / factor), 9)
  })

  it('zooming in past the minimum span stops at 4 cycles around the anchor', () => {
    const z = zoomWindow({ start: 0, end: 120 }, 1000, 60, bounds)
    expect(z.end - z.start).toBeCloseTo(4, 9)
    expect(z.start).toBeCloseTo(58, 9)
  })

  it.each([
    [10, { start: 30, end: 70 }],
    [-100, { start: 0, end: 40 }],
    [1000, { start: 80, end: 120 }],
  ])('panning by %i cycles moves the window and stops at the ends of the run', (delta, expected) => {
    expect(panWindow({ start: 20, end: 60 }, delta, bounds)).toEqual(expected)
  })

  it.each([
    [{ start: 0, end: 120 }],
    [{ start: 12.5, end: 40 }],
    [{ start: 100, end: 104 }],
  ])('a window survives the round trip through a zoom transform: %o', (w) => {
    const back = transformToWindow(windowToTransform(w, 120, 800), 120, 800)
    expect(sameWindow(back, w)).toBe(true)
  })

  // Reference: d3-zoom's documented transform.rescaleX(x) gives the domain a transform shows.
  it.each([
    [{ start: 0, end: 120 }],
    [{ start: 30, end: 90 }],
    [{ start: 7, end: 11 }],
  ])('the transform of %o shows the same domain as d3-zoom rescaleX', (w) => {
    const t = windowToTransform(w, 120, 800)
    const domain = zoomIdentity.translate(t.x, 0).scale(t.k).rescaleX(scaleLinear().domain([0, 120]).range([0, 800])).domain()
    expect(domain[0]).toBeCloseTo(w.start, 9)
    expect(domain[1]).toBeCloseTo(w.end, 9)
  })

  it('a scale maps the window onto the plot width and back', () => {
    const s = cycleScale({ start: 10, end: 50 }, 400)
    expect(s.k).toBe(10)
    expect(s.toPx(10)).toBe(0)
    expect(s.toPx(50)).toBe(400)
    expect(s.toCycle(205)).toBe(30.5)
  })

  it.each([
    ['an empty window', () => cycleScale({ start: 5, end: 5 }, 100), /non-empty/],
    ['a zero zoom factor', () => zoomWindow({ start: 0, end: 10 }, 0, 5, bounds), /positive/],
    ['a window of NaN', () => clampWindow({ start: NaN, end: 10 }, bounds), /finite/],
  ])('%s is refused with a clear error', (_what, call, message) => {
    expect(call).toThrow(message)
  })
})
