/**
 * The run's arena (shared/sim/timing/arena.ts): views that never overlap,
 * start zeroed and sit at offsets their element size divides (ECMAScript
 * 2024, 23.2.5.1: a view at a misaligned byteOffset is a RangeError), and a
 * request too large for a chunk gets a buffer of its own.
 */
import { describe, expect, it } from 'vitest'
import { Arena } from '../../../shared/sim/timing/arena'

describe('arena', () => {
  it('hands out zeroed, aligned views that do not overlap', () => {
    const arena = new Arena()
    const a = arena.u8(3)
    const b = arena.i32(5)
    const c = arena.i8(1)
    const d = arena.i32(2)
    expect(b.byteOffset % 4).toBe(0)
    expect(d.byteOffset % 4).toBe(0)
    for (const v of [a, b, c, d]) expect([...v].every((x) => x === 0)).toBe(true)
    a.fill(0xff)
    b.fill(-1)
    c.fill(-1)
    d.fill(7)
    expect([...a]).toEqual([255, 255, 255])
    expect([...b]).toEqual([-1, -1, -1, -1, -1])
    expect([...c]).toEqual([-1])
    expect([...d]).toEqual([7, 7])
    // Small views share one buffer.
    expect(b.buffer).toBe(a.buffer)
  })

  it('starts a new chunk when one is full, and gives a large request its own buffer', () => {
    const arena = new Arena()
    // Four views of 16 KiB fill a 64 KiB chunk; the fifth starts another.
    const four = [arena.i32(4096), arena.i32(4096), arena.i32(4096), arena.i32(4096)]
    expect(four.every((v) => v.buffer === four[0]?.buffer)).toBe(true)
    const next = arena.i32(4096)
    expect(next.buffer).not.toBe(four[0]?.buffer)
    const large = arena.i32(1 << 16)
    expect(large.byteOffset).toBe(0)
    expect(large.buffer.byteLength).toBe(1 << 18)
    // The chunk in use is not given up for the large request.
    expect(arena.u8(1).buffer).toBe(next.buffer)
  })
})
