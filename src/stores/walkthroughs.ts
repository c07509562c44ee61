/**
 * The walkthroughs of the scenario on the Bench (they are saved with its
 * version, like its expectations). The recorder edits them here; the
 * player (stores/walkthroughPlayer.ts) only reads one.
 */
import { computed, shallowRef } from 'vue'
import { defineStore } from 'pinia'
import { WALKTHROUGHS_MAX, walkthroughListSchema, type Walkthrough } from '@shared/schemas/walkthrough'

export const useWalkthroughsStore = defineStore('walkthroughs', () => {
  // A shallowRef: the list is replaced whole, and a deep proxy would break structuredClone on save.
  const list = shallowRef<Walkthrough[]>([])
  const full = computed(() => list.value.length >= WALKTHROUGHS_MAX)

  /** Puts a scenario's walkthroughs on the Bench (validated: a share or an older client's version may differ). */
  function setList(walkthroughs: unknown): void {
    const parsed = walkthroughListSchema.safeParse(walkthroughs)
    list.value = parsed.success ? parsed.data : []
  }
  /** Replaces walkthrough `index`, or adds one at the end when index is null. */
  function put(index: number | null, w: Walkthrough): void {
    if (index === null) {
      if (!full.value) list.value = [...list.value, w]
    } else list.value = list.value.map((x, i) => (i === index ? w : x))
  }
  function remove(index: number): void {
    list.value = list.value.filter((_, i) => i !== index)
  }
  function $reset(): void {
    list.value = []
  }
  return { list, full, setList, put, remove, $reset }
})
