/** What "Sweep this" proposes for a program: worked out from the examples' own AVL lines. */
import { describe, expect, it } from 'vitest'
import longStream from '../../../examples/long-stream.s?raw'
import saxpy from '../../../examples/saxpy.s?raw'
import { defaultParameters } from '@/lib/sweeps/defaults'

describe('Sweep this', () => {
  it("sweeps the vector length up to the program's own AVL, serial against staggered", () => {
    // examples/saxpy.s: `.equ AVL, 19` over 19 elements of data; long-stream.s: 256.
    expect(defaultParameters(saxpy)).toEqual([{ path: 'AVL', spec: '1..19' }, { path: 'issue', spec: 'serial,staggered' }])
    expect(defaultParameters(longStream)[0]).toEqual({ path: 'AVL', spec: '1..256' })
  })

  it('falls back to 1..256 when AVL is an expression, and to the lane count without AVL', () => {
    expect(defaultParameters('.equ AVL, 8*32\n')[0]).toEqual({ path: 'AVL', spec: '1..256' })
    expect(defaultParameters('vadd.vv v1, v2, v3\n')).toEqual([{ path: 'lanes', spec: '1,2,4,8,16' }])
  })
})
