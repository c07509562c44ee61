/**
 * The parameters "Sweep this" starts from: with an AVL symbol, the vector
 * length from 1 up to the program's own AVL (an example with fixed data, such
 * as saxpy's 19 elements, fails past it) against the two issue policies of the
 * trade's question; without one, the lane count.
 */
import type { SweepParameter } from '@shared/schemas/sweep'
import { symbolDefinitions } from '@shared/sweep/symbols'

export function defaultParameters(program: string): SweepParameter[] {
  const avl = symbolDefinitions(program).find((d) => d.name === 'AVL')
  if (!avl) return [{ path: 'lanes', spec: '1,2,4,8,16' }]
  const own = /^\d+$/.test(avl.value) ? Number(avl.value) : 0
  return [{ path: 'AVL', spec: `1..${own >= 2 ? own : 256}` }, { path: 'issue', spec: 'serial,staggered' }]
}
