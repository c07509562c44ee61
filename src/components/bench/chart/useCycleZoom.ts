/**
 * Binds d3-zoom (wheel, drag, touch) to a plot element and translates its
 * transforms into cycle windows (see windowToTransform in the chart logic).
 * Only the x part of a transform is used. `sync()` puts the behaviour's
 * transform in line with a window set by other means (keys, the overview
 * brush, the parent); the zoom event that follows carries no source event and
 * is ignored, so no loop arises.
 */
import { onBeforeUnmount, onMounted, type Ref } from 'vue'
import { select, zoom, zoomIdentity, type D3ZoomEvent, type ZoomBehavior } from 'd3'
import { chartTakesGesture } from '@/lib/lanechart/gestures'
import { DEFAULT_MIN_SPAN, transformToWindow, windowToTransform, type CycleWindow } from '@/lib/lanechart/window'

export interface CycleZoomOptions {
  cycles: () => number
  width: () => number
  height: () => number
  view: () => CycleWindow
  onChange: (w: CycleWindow) => void
  /** True once the user has clicked the chart (it has the focus): the wheel then zooms without Ctrl or Cmd. */
  engaged: () => boolean
}

export function useCycleZoom(target: Ref<HTMLElement | null>, options: CycleZoomOptions) {
  let behaviour: ZoomBehavior<HTMLElement, unknown> | null = null

  function configure(b: ZoomBehavior<HTMLElement, unknown>) {
    const w = Math.max(1, options.width())
    const h = Math.max(1, options.height())
    b.extent([[0, 0], [w, h]])
      .translateExtent([[0, 0], [w, h]])
      .scaleExtent([1, Math.max(1, options.cycles() / DEFAULT_MIN_SPAN)])
  }

  function sync() {
    const el = target.value
    if (!el || !behaviour) return
    configure(behaviour)
    const t = windowToTransform(options.view(), options.cycles(), Math.max(1, options.width()))
    select(el).call(behaviour.transform, zoomIdentity.translate(t.x, 0).scale(t.k))
  }

  onMounted(() => {
    const el = target.value
    if (!el) return
    behaviour = zoom<HTMLElement, unknown>()
      // Keep d3-zoom from interpreting a click as a tiny pan.
      .clickDistance(3)
      .filter((event: WheelEvent | MouseEvent) => chartTakesGesture(event, options.engaged()))
      .on('zoom', (event: D3ZoomEvent<HTMLElement, unknown>) => {
        if (!event.sourceEvent) return
        options.onChange(transformToWindow(event.transform, options.cycles(), Math.max(1, options.width())))
      })
    select(el).call(behaviour).on('dblclick.zoom', null)
    sync()
  })

  onBeforeUnmount(() => {
    if (target.value) select(target.value).on('.zoom', null)
  })

  return { sync }
}
