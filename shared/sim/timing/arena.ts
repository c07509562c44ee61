/**
 * Typed arrays for one run's instructions, carved from shared buffers of
 * 64 KiB. A run builds thousands of instructions with about two dozen small
 * per-lane arrays each (29,000 for one point of the 1,000-instruction long
 * stream), and a typed array with a buffer of its own is an allocation
 * outside the JavaScript heap, slow to make and to free: about 0.8 us each in
 * Node, and in Chromium's Workers the allocations of different Workers take
 * turns, so that two sweep Workers ran no faster than one. A view on a shared
 * buffer is a small object on the heap. A buffer goes once no view on it is
 * left; instructions are dropped in the order they were made, so a long run
 * still holds only the buffers of the instructions around those in flight.
 */
const CHUNK_BYTES = 1 << 16
/** Requests above this take a buffer of their own rather than waste the rest of a chunk. */
const OWN_BUFFER_BYTES = CHUNK_BYTES / 4

export class Arena {
  private buffer = new ArrayBuffer(0)
  private at = 0

  /**
   * Reserves `bytes` at an offset that is a multiple of `align` (a power of
   * two) in `buffer` and returns the offset; -1: the request takes a buffer of
   * its own. (An offset, not a [buffer, offset] pair: a pair is an allocation
   * per typed array, thousands per run.)
   */
  private take(bytes: number, align: number): number {
    if (bytes > OWN_BUFFER_BYTES) return -1
    let at = (this.at + align - 1) & -align
    if (at + bytes > this.buffer.byteLength) {
      this.buffer = new ArrayBuffer(CHUNK_BYTES)
      at = 0
    }
    this.at = at + bytes
    return at
  }

  /** A zeroed Int32Array of n elements. */
  i32(n: number): Int32Array {
    const at = this.take(n * 4, 4)
    return at < 0 ? new Int32Array(n) : new Int32Array(this.buffer, at, n)
  }

  /** A zeroed Uint8Array of n elements. */
  u8(n: number): Uint8Array {
    const at = this.take(n, 1)
    return at < 0 ? new Uint8Array(n) : new Uint8Array(this.buffer, at, n)
  }

  /** A zeroed Int8Array of n elements. */
  i8(n: number): Int8Array {
    const at = this.take(n, 1)
    return at < 0 ? new Int8Array(n) : new Int8Array(this.buffer, at, n)
  }
}
