/**
 * The yardstick of `npm run bench` (issue 11): the least a cycle-stepped model
 * of one lane must do each cycle, with nothing else. Per lane and cycle it
 * arbitrates the ports of 6 register-file banks (one port each), fills 3
 * operand queues of 4 words (one word each a cycle when its bank is free),
 * takes a beat when all three queues hold a word, and shifts an 8-stage
 * pipeline, counting results. State lives in typed arrays; nothing is
 * allocated per cycle. The result is returned so the work cannot be dropped.
 */
const BANKS = 6
const QUEUES = 3
const QUEUE_DEPTH = 4
const STAGES = 8

export function bareLoop(lanes: number, cycles: number): number {
  const bankCycle = new Int32Array(lanes * BANKS).fill(-1)
  const fill = new Int32Array(lanes * QUEUES)
  const word = new Int32Array(lanes * QUEUES)
  const pipe = new Int32Array(lanes * STAGES)
  let results = 0
  for (let c = 0; c < cycles; c++) {
    for (let l = 0; l < lanes; l++) {
      const qb = l * QUEUES
      const bb = l * BANKS
      // Read: each queue with room asks its word's bank (source registers 2, 4 and 8 + lane).
      for (let q = 0; q < QUEUES; q++) {
        if ((fill[qb + q] as number) >= QUEUE_DEPTH) continue
        const reg = q === 2 ? 8 + l : 2 + 2 * q
        const bank = (reg + (word[qb + q] as number)) % BANKS
        if (bankCycle[bb + bank] === c) continue
        bankCycle[bb + bank] = c
        fill[qb + q] = (fill[qb + q] as number) + 1
        word[qb + q] = (word[qb + q] as number) + 1
      }
      // Execute: shift the pipeline, then a beat enters when every queue has a word.
      const pb = l * STAGES
      results += pipe[pb + STAGES - 1] as number
      for (let s = STAGES - 1; s > 0; s--) pipe[pb + s] = pipe[pb + s - 1] as number
      let beat = 1
      for (let q = 0; q < QUEUES; q++) if ((fill[qb + q] as number) === 0) beat = 0
      if (beat) for (let q = 0; q < QUEUES; q++) fill[qb + q] = (fill[qb + q] as number) - 1
      pipe[pb] = beat
    }
  }
  return results
}
