/**
 * A growing list indexed by absolute position whose old entries can be
 * dropped: the engine's program-order lists of arithmetic and memory
 * instructions keep only what is still looked at, so that a long run does not
 * hold every instruction it ever timed.
 */
export class ProgramOrderList<T> {
  private items: (T | undefined)[] = []
  /** Absolute index of items[0]. */
  private base = 0

  get length(): number {
    return this.base + this.items.length
  }

  push(item: T): void {
    this.items.push(item)
  }

  /** The entry at absolute index k; undefined past the end (or if dropped). */
  at(k: number): T | undefined {
    return this.items[k - this.base]
  }

  /** Forgets the entries before absolute index k (in batches, so that dropping stays cheap). */
  dropBefore(k: number): void {
    const n = k - this.base
    if (n < 256 || n * 2 < this.items.length) return
    this.items = this.items.slice(n)
    this.base = k
  }
}
