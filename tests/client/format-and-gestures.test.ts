/**
 * Issue 10: one number format through Intl ("35,494" everywhere, en-US as
 * the test runs), and the wheel zooms the Lane chart only when asked.
 */
import { describe, expect, it } from 'vitest'
import { chartTakesGesture } from '@/lib/lanechart/gestures'
import { formatCycle } from '@/lib/lanechart/ruler'
import { formatDecimal, formatInteger } from '@/utils/format'

describe('one number format', () => {
  it('groups thousands as the locale does (en-US here) and rounds to the digits asked', () => {
    expect(new Intl.NumberFormat().resolvedOptions().locale).toMatch(/^en/)
    expect(formatInteger(35494)).toBe('35,494')
    expect(formatCycle(35494)).toBe('35,494')
    expect(formatDecimal(14.2167)).toBe('14.22')
    expect(formatDecimal(1234.5, 1)).toBe('1,234.5')
  })
})

describe('the wheel over the Lane chart', () => {
  const wheel = { type: 'wheel', ctrlKey: false, metaKey: false, button: 0 }
  it('scrolls the page by default', () => {
    expect(chartTakesGesture(wheel, false)).toBe(false)
  })
  it('zooms with Ctrl or Cmd held, or once the chart was clicked', () => {
    expect(chartTakesGesture({ ...wheel, ctrlKey: true }, false)).toBe(true)
    expect(chartTakesGesture({ ...wheel, metaKey: true }, false)).toBe(true)
    expect(chartTakesGesture(wheel, true)).toBe(true)
  })
  it('still pans with a main-button drag, never with the secondary button', () => {
    expect(chartTakesGesture({ type: 'mousedown', ctrlKey: false, metaKey: false, button: 0 }, false)).toBe(true)
    expect(chartTakesGesture({ type: 'mousedown', ctrlKey: false, metaKey: false, button: 2 }, false)).toBe(false)
  })
})
