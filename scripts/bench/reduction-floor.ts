/**
 * The least model of the bench's reduction-heavy stream (issue 11): how fast
 * can any cycle-stepped model go that does the work the timing rules ask of
 * these lanes, measured beside the bare loop in the same process?
 *
 * It times `count` unordered FP64 sums (`vfredusum.vs vd, v2, v4`, vl 256,
 * LMUL 2, vd cycling over 8 registers, 2 scalar instructions after every 8,
 * as `reductionHeavy` in programs.ts, with v2 and v4 already written) by the
 * rules of docs/model.md, written for this stream alone: in-order dispatch of
 * one op a cycle into the arithmetic queue with renaming of vd; `staggered`
 * issue within the lane slots; one vs2 word a cycle into its operand queue
 * through the register-file bank of the word; a beat into accumulator
 * j mod A when its previous add is done; the accumulators combined pairwise
 * (the two earliest ready); the running value down the ring from the top
 * lane, each lane adding its partial on arrival; vs1[0] added in lane 0 and
 * vd[0] written through a bank port. Every lane-cycle is classified busy or
 * stalled with one reason, and every refusal counted per instruction. With
 * `recordUsage` it records each use of a unit, bank or link into the least
 * span table there can be (`spanTable`), and stall spans the same way.
 *
 * All state lives in typed arrays made once per run, instructions in a ring
 * of slots; nothing is allocated per cycle, no object stands for an
 * instruction and no call goes through a kind. It keeps no per-lane phase
 * times (the engine records eight per lane and instruction) and checks
 * nothing a general engine checks for other programs, so it is a floor for
 * this stream, not a model: `tests/bench/reduction-floor.test.ts` checks it
 * against the engine on the same stream and against a bound worked by hand.
 */
import type { Machine } from '../../shared/schemas/machine'
import { REASON, STALL_RANK, STALL_REASONS } from '../../shared/sim/trace/types'

export interface FloorRun {
  cycles: number
  /** Busy lane-cycles of each lane. */
  busy: Int32Array
  usageRows: number
  stallRows: number
  /** Stall lane-cycles by reason index (STALL_REASONS). */
  stallCycles: Float64Array
}

/** The stream's shape: vl, the destinations it cycles over, and the scalar instructions after each round. */
const VL = 256
const DESTINATIONS = 8
const SCALARS_PER_ROUND = 2
/** Architectural registers: v2-v3 hold vs2 (LMUL 2), v4 holds vs1, vd is v8, v10, ..., v22. */
const ARCH_REGS = 32
const VS2 = 2
const VS1 = 4
const FIRST_VD = 8
/** Instructions the ring of slots holds: more than the queue and the lane slots can keep in flight. */
const SLOTS = 64
/** Resources of one lane: its units (the engine's alu, mul, fpu, div; the FPU is index 2) and its banks. */
const UNITS = 4
const FPU = 2
// Stall reasons as the trace numbers them; a lane-cycle refused twice keeps the stronger (STALL_RANK).
const R_RAW = REASON.raw
const R_BANK = REASON.bank
const R_QUEUE = REASON.queue
const R_SLOT = REASON.slot
const R_RENAME = REASON.rename
const R_RING = REASON.ring
const R_FRONTEND = REASON.frontend
const REASONS = STALL_REASONS.length
const RANK: Int8Array = STALL_RANK
const NONE = -1
const PENDING = 0x7fffffff
/** Where an instruction's running value is (as the engine's ReductionInst stages). */
const FOLDING = 0 // lanes fold their beats and combine their accumulators
const SEND = 1 // the value waits in lane sPos to be sent down the ring
const ADD = 2 // the value is on its way to lane sPos, added there on arrival
const FINAL = 3 // lane 0 adds vs1[0]
const WRITE = 4 // lane 0 writes vd[0]

/**
 * The least span recorder: per key (a resource, a lane) one open span,
 * extended by a use of the same instruction and tag in the cycle after its
 * end, else closed into a row of start, length, instruction, tag and key.
 * The engine's SpanRecorder also keeps amounts and write marks.
 */
function spanTable(keys: number) {
  const inst = new Int32Array(keys).fill(NONE)
  const tag = new Int32Array(keys)
  const start = new Int32Array(keys)
  const end = new Int32Array(keys)
  let table = new Int32Array(5 * 1024)
  let closed = 0
  return {
    add(key: number, c: number, i: number, t: number): void {
      if (inst[key] === i && tag[key] === t && end[key] === c) {
        end[key] = c + 1
        return
      }
      if ((inst[key] as number) >= 0) {
        if ((closed + 1) * 5 > table.length) {
          const grown = new Int32Array(table.length * 2)
          grown.set(table)
          table = grown
        }
        const o = closed * 5
        table[o] = start[key] as number
        table[o + 1] = (end[key] as number) - (start[key] as number)
        table[o + 2] = inst[key] as number
        table[o + 3] = tag[key] as number
        table[o + 4] = key
        closed++
      }
      inst[key] = i
      tag[key] = t
      start[key] = c
      end[key] = c + 1
    },
    /** Rows, counting the spans still open (the engine closes them when it builds the trace). */
    rows(): number {
      let open = 0
      for (let k = 0; k < keys; k++) if ((inst[k] as number) >= 0) open++
      return closed + open
    },
  }
}

/** Throws unless the machine is one the floor is written for (the defaults in these respects). */
function check(m: Machine): void {
  const ok =
    m.issue === 'staggered' &&
    m.interLane === 'ring' &&
    m.dispatchWidth === 1 &&
    m.rfPortsPerBank === 1 &&
    m.fpuElementsPerCycle['64'] === 1 &&
    m.lanes >= 2 &&
    VL % m.lanes === 0 &&
    (2 * m.vlen) / 64 >= VL &&
    m.arithQueueDepth + m.laneSlots <= SLOTS / 2
  if (!ok) throw new Error('reductionFloor is written for staggered issue, a ring, one dispatch and one port, one FP64 element a beat, vl 256 a multiple of the lanes within two registers, and fewer instructions in flight than its slots')
}

/**
 * Times `count` reductions on `m`; the front end first spends `lead` cycles
 * on what comes before the first one (scalar instructions, a vset: one a cycle).
 */
export function reductionFloor(m: Machine, count: number, recordUsage: boolean, lead = 0): FloorRun {
  check(m)
  const L = m.lanes
  const banks = m.rfBanks
  const wpr = Math.ceil(m.vlen / 64 / L)
  const depth = m.operandQueueDepth
  const D = m.units.fpu.latency
  const A = m.reductionAccumulators
  const laneSlots = m.laneSlots
  const queueDepth = m.arithQueueDepth
  const phys = m.physRegs
  const hop = m.ringHopLatency
  const words = VL / L // vs2 words a lane reads: one FP64 element each
  const combines = Math.min(A, words) - 1
  // Per vs2 word, looked up rather than divided each cycle (as the engine's RegFile.bankOfWord): its offset
  // in the register words of a lane ([phys][lane][word] less the lane's part), its bank, and its accumulator.
  const vs2Word = new Int32Array(words)
  const vs2Bank = new Int32Array(words)
  const accOf = new Int32Array(words)
  for (let w = 0; w < words; w++) {
    const reg = VS2 + Math.floor(w / wpr)
    vs2Word[w] = reg * L * wpr + (w % wpr)
    vs2Bank[w] = (reg + (w % wpr)) % banks
    accOf[w] = w % A
  }
  const vs1Bank = VS1 % banks

  // Per slot (an instruction in flight: slot = seq mod SLOTS).
  const sSeq = new Int32Array(SLOTS).fill(NONE)
  const sDispatch = new Int32Array(SLOTS)
  const sVd = new Int32Array(SLOTS)
  const sOldVd = new Int32Array(SLOTS)
  /** FOLDING, SEND, ADD, FINAL or WRITE. */
  const sStage = new Int32Array(SLOTS)
  const sPos = new Int32Array(SLOTS)
  const sValueAt = new Int32Array(SLOTS)
  const sStarted = new Int32Array(SLOTS)
  const sDone = new Int32Array(SLOTS)
  const sVs1Read = new Uint8Array(SLOTS)
  const sWritten = new Uint8Array(SLOTS)
  // Per slot and lane ([slot * L + lane]).
  const readCnt = new Int32Array(SLOTS * L)
  const beats = new Int32Array(SLOTS * L)
  const partials = new Int32Array(SLOTS * L)
  const laneValue = new Int32Array(SLOTS * L)
  const laneDone = new Uint8Array(SLOTS * L)
  const readEnd = new Int32Array(SLOTS * L)
  const noteCycle = new Int32Array(SLOTS * L).fill(NONE)
  const noteReason = new Int8Array(SLOTS * L)
  const acc = new Int32Array(SLOTS * L * A)
  // Per lane.
  const fpuFree = new Int32Array(L)
  const portCycle = new Int32Array(L * banks).fill(NONE)
  const slotsUsed = new Int32Array(L)
  const slotsReleased = new Int32Array(L)
  const nextSeq = new Int32Array(L)
  const active = new Int32Array(L * SLOTS)
  const nActive = new Int32Array(L)
  const denied = new Int32Array(L * SLOTS)
  const nDenied = new Int32Array(L)
  const progress = new Uint8Array(L)
  const reader = new Int32Array(L)
  const refused = new Int32Array(L)
  const busy = new Int32Array(L)
  const downBooked = new Int32Array(L).fill(NONE)
  // Renaming and register words ([phys][lane][word]: first cycle readable).
  const ready = new Int32Array(phys * L * wpr)
  // Free physical registers as a stack, the lowest on top at first (as the engine's Renamer).
  const freeList = new Int32Array(phys)
  let freeCount = phys - ARCH_REGS
  for (let i = 0; i < freeCount; i++) freeList[i] = phys - 1 - i
  const archToPhys = Int32Array.from({ length: ARCH_REGS }, (_, i) => i)
  /** Per instruction and reason, every refusal (the engine's per-instruction stall counts; written, as there, for the trace). */
  const opStalls = new Int32Array(count * REASONS)
  const stallTotals = new Float64Array(REASONS)

  // Usage spans per resource and stall spans per lane, each use or stall also counted in the totals.
  const resources = L * (UNITS + banks) + L
  const linkBase = L * (UNITS + banks)
  const totals = new Float64Array(resources)
  const usage = spanTable(resources)
  const stalls = spanTable(L)
  const use = (r: number, c: number, inst: number): void => {
    totals[r] = (totals[r] as number) + 1
    if (recordUsage) usage.add(r, c, inst, 0)
  }
  const stall = (l: number, c: number, reason: number, inst: number): void => {
    stallTotals[reason] = (stallTotals[reason] as number) + 1
    stalls.add(l, c, inst, reason)
  }

  let c = 0
  const deny = (l: number, k: number, reason: number): void => {
    const j = k * L + l
    if (noteCycle[j] === c) {
      if ((RANK[reason] as number) < (RANK[noteReason[j] as number] as number)) noteReason[j] = reason
      return
    }
    noteCycle[j] = c
    noteReason[j] = reason
    denied[l * SLOTS + (nDenied[l] as number)] = k
    nDenied[l] = (nDenied[l] as number) + 1
  }
  /** The lane's FPU takes an operation of instruction `seq` this cycle (a beat, a combine or an add). */
  const beat = (l: number, fpu: number, seq: number): void => {
    fpuFree[l] = c + 1
    use(fpu, c, seq)
    progress[l] = 1
  }
  const grant = (l: number, bank: number): boolean => {
    const k = l * banks + bank
    if (portCycle[k] === c) return false
    portCycle[k] = c
    return true
  }
  let dispatched = 0
  let queued = 0
  let completed = 0
  let scalarLeft = lead
  /** No instruction before this one is still in flight. */
  let first = 0
  const finishLane = (k: number, l: number): void => {
    const j = k * L + l
    laneDone[j] = 1
    sDone[k] = (sDone[k] as number) + 1
    const b = l * SLOTS
    const n = nActive[l] as number
    let at = 0
    while (at < n && active[b + at] !== k) at++
    for (let q = at; q < n - 1; q++) active[b + q] = active[b + q + 1] as number
    nActive[l] = n - 1
    slotsReleased[l] = (slotsReleased[l] as number) + 1
    if (sDone[k] === L && sWritten[k] === 1) {
      completed++
      freeList[freeCount++] = sOldVd[k] as number
      sSeq[k] = NONE
    }
  }

  while (completed < count) {
    for (let l = 0; l < L; l++) {
      progress[l] = 0
      nDenied[l] = 0
      reader[l] = NONE
      refused[l] = NONE
    }
    // The ring: a running value ready in lane sPos leaves for the lane below over its "down" link.
    while (first < dispatched && sSeq[first % SLOTS] !== first) first++
    for (let seq = first; seq < dispatched; seq++) {
      const k = seq % SLOTS
      if (sStage[k] !== SEND || sSeq[k] !== seq || c < (sValueAt[k] as number)) continue
      const from = sPos[k] as number
      if (downBooked[from - 1] === c) {
        deny(from, k, R_RING)
        continue
      }
      downBooked[from - 1] = c
      use(linkBase + from - 1, c, sSeq[k] as number)
      progress[from] = 1
      finishLane(k, from)
      sPos[k] = from - 1
      sValueAt[k] = c + hop
      sStage[k] = ADD
    }
    for (let l = 0; l < L; l++) {
      const b = l * SLOTS
      // Writes: lane 0 writes vd[0] once the last add is done (a lane waiting on the ring is found when classified).
      for (let i = 0; i < (nActive[l] as number); i++) {
        const k = active[b + i] as number
        if (l !== 0 || sStage[k] !== WRITE) continue
        if ((sValueAt[k] as number) > c) {
          progress[l] = 1
          continue
        }
        const p = sVd[k] as number
        const bank = p % banks
        if (!grant(0, bank)) {
          deny(0, k, R_BANK)
          continue
        }
        use(UNITS + bank, c, sSeq[k] as number)
        ready[p * L * wpr] = c + 1
        progress[0] = 1
        sWritten[k] = 1
        finishLane(k, 0)
        i--
      }
      // Beats, combines and the ring's adds on the lane's FPU, oldest instruction first.
      const fpu = l * (UNITS + banks) + FPU
      for (let i = 0; i < (nActive[l] as number); i++) {
        if ((fpuFree[l] as number) > c) break
        const k = active[b + i] as number
        const j = k * L + l
        const seq = sSeq[k] as number
        const done = beats[j] as number
        if (done < words) {
          if ((readCnt[j] as number) < done + 1) continue
          const a = j * A + (accOf[done] as number)
          if ((acc[a] as number) > c) {
            progress[l] = 1 // the accumulator's previous add is in the pipeline
            continue
          }
          beat(l, fpu, seq)
          acc[a] = c + D
          beats[j] = done + 1
          if (done + 1 === words) partials[j] = combines + 1
          continue
        }
        if ((laneValue[j] as number) < 0) {
          const base = j * A
          let i1 = NONE
          let i2 = NONE
          let pending = false
          for (let q = 0; q < A; q++) {
            const t = acc[base + q] as number
            if (t < 0) continue
            if (t > c) {
              pending = true
              continue
            }
            if (i1 < 0 || t < (acc[base + i1] as number)) {
              i2 = i1
              i1 = q
            } else if (i2 < 0 || t < (acc[base + i2] as number)) i2 = q
          }
          if ((partials[j] as number) <= 1) {
            if (!pending && i1 >= 0) laneValue[j] = acc[base + i1] as number
            else progress[l] = 1
            if (l === L - 1 && (laneValue[j] as number) >= 0 && sStage[k] === FOLDING) {
              sPos[k] = l
              sValueAt[k] = laneValue[j] as number
              sStage[k] = SEND
            }
            continue
          }
          if (i1 < 0 || i2 < 0) {
            progress[l] = 1
            continue
          }
          beat(l, fpu, seq)
          acc[base + i1] = c + D
          acc[base + i2] = NONE
          partials[j] = (partials[j] as number) - 1
          continue
        }
        if (sStage[k] === ADD && sPos[k] === l && c >= (sValueAt[k] as number) && (laneValue[j] as number) <= c) {
          beat(l, fpu, seq)
          sValueAt[k] = c + D
          sStage[k] = l === 0 ? FINAL : SEND
          continue
        }
        if (sStage[k] === FINAL && l === 0 && c >= (sValueAt[k] as number) && sVs1Read[k] === 1) {
          beat(l, fpu, seq)
          sValueAt[k] = c + D
          sStage[k] = WRITE
        }
      }
      // Issue (staggered): the next instruction starts the cycle after the lane finished reading the previous one.
      const seq = nextSeq[l] as number
      if (seq < dispatched && (sDispatch[seq % SLOTS] as number) < c) {
        const k = seq % SLOTS
        const pk = (seq + SLOTS - 1) % SLOTS
        const pj = pk * L + l
        const prevReading = seq > 0 && sSeq[pk] === seq - 1 && laneDone[pj] === 0 && ((readEnd[pj] as number) < 0 || (readEnd[pj] as number) >= c)
        if (!prevReading) {
          if ((slotsUsed[l] as number) >= laneSlots) {
            deny(l, k, R_SLOT)
            refused[l] = k
          } else {
            slotsUsed[l] = (slotsUsed[l] as number) + 1
            nextSeq[l] = seq + 1
            active[b + (nActive[l] as number)] = k
            nActive[l] = (nActive[l] as number) + 1
            sStarted[k] = (sStarted[k] as number) + 1
            if (sStarted[k] === L) queued--
          }
        }
      }
      // Reads: one vs2 word a cycle into its operand queue (and vs1[0] in lane 0), oldest instruction first.
      for (let i = 0; i < (nActive[l] as number); i++) {
        const k = active[b + i] as number
        const j = k * L + l
        if ((readEnd[j] as number) >= 0 && (readEnd[j] as number) < c) continue
        const seq = sSeq[k] as number
        if (reader[l] === NONE) reader[l] = k
        let w = readCnt[j] as number
        let readAny = false
        let full = false
        if (w < words) {
          // A beat takes one element, one word: the queue holds the words read and not yet beaten.
          if (w - (beats[j] as number) >= depth) full = true
          else {
            const bank = vs2Bank[w] as number
            if ((ready[(vs2Word[w] as number) + l * wpr] as number) > c) deny(l, k, R_RAW)
            else if (!grant(l, bank)) deny(l, k, R_BANK)
            else {
              use(l * (UNITS + banks) + UNITS + bank, c, seq)
              readCnt[j] = ++w
              readAny = true
            }
          }
        }
        if (l === 0 && sVs1Read[k] === 0) {
          if ((ready[VS1 * L * wpr] as number) > c) deny(0, k, R_RAW)
          else if (!grant(0, vs1Bank)) deny(0, k, R_BANK)
          else {
            use(UNITS + vs1Bank, c, seq)
            sVs1Read[k] = 1
            readAny = true
          }
        }
        // A full queue while the other operand reads only shows that operand is behind (as InstState.read).
        if (full && !readAny) deny(l, k, R_QUEUE)
        if (readAny) {
          progress[l] = 1
          if (w >= words && (l !== 0 || sVs1Read[k] === 1)) readEnd[j] = c
        }
      }
    }
    // The front end: the loop's scalar instructions, then one reduction a cycle into the queue, renaming vd.
    let feReason = R_FRONTEND
    let feSeq = NONE
    if (dispatched < count) {
      const k = dispatched % SLOTS
      if (scalarLeft > 0) scalarLeft--
      else if (queued >= queueDepth || sSeq[k] !== NONE) feReason = R_QUEUE
      else if (freeCount === 0) feReason = R_RENAME
      else {
        sSeq[k] = dispatched
        sDispatch[k] = c
        sStage[k] = FOLDING
        sStarted[k] = 0
        sDone[k] = 0
        sVs1Read[k] = 0
        sWritten[k] = 0
        for (let l = 0; l < L; l++) {
          const j = k * L + l
          readCnt[j] = 0
          beats[j] = 0
          partials[j] = 0
          laneValue[j] = NONE
          laneDone[j] = 0
          readEnd[j] = NONE
          noteCycle[j] = NONE
          acc.fill(NONE, j * A, j * A + A)
        }
        const vd = FIRST_VD + 2 * (dispatched % DESTINATIONS)
        sOldVd[k] = archToPhys[vd] as number
        const p = freeList[--freeCount] as number
        archToPhys[vd] = p
        sVd[k] = p
        ready.fill(PENDING, p * L * wpr, (p + 1) * L * wpr)
        feSeq = dispatched
        dispatched++
        queued++
        if (dispatched % DESTINATIONS === 0) scalarLeft = SCALARS_PER_ROUND
      }
    }
    // The front end's reason for a lane starved of work: what it dispatched this cycle reaches the lanes
    // next cycle; else why it could not dispatch; none once it has nothing more to give (the lane is idle).
    const feStall = feSeq !== NONE ? R_FRONTEND : dispatched < count ? feReason : NONE
    const feStallSeq = feSeq !== NONE ? feSeq : dispatched
    // Each lane-cycle: busy (its critical instruction may still have been refused), or stalled with one reason.
    for (let l = 0; l < L; l++) {
      const nd = nDenied[l] as number
      let oldest = NONE
      for (let i = 0; i < nd; i++) {
        const k = denied[l * SLOTS + i] as number
        if (oldest === NONE || (sSeq[k] as number) < (sSeq[oldest] as number)) oldest = k
        const at = (sSeq[k] as number) * REASONS + (noteReason[k * L + l] as number)
        opStalls[at] = (opStalls[at] as number) + 1
      }
      let reason = NONE
      let seq = NONE
      if (progress[l] === 1) {
        busy[l] = (busy[l] as number) + 1
        const r = reader[l] as number
        const f = refused[l] as number
        const crit = r !== NONE && (f === NONE || (sSeq[r] as number) < (sSeq[f] as number)) ? r : f !== NONE ? f : nActive[l] ? (active[l * SLOTS] as number) : NONE
        if (crit !== NONE && noteCycle[crit * L + l] === c) stall(l, c, noteReason[crit * L + l] as number, sSeq[crit] as number)
        else if (r === NONE && f === NONE && !(nextSeq[l]! < dispatched && sDispatch[nextSeq[l]! % SLOTS]! < c)) {
          reason = feStall
          seq = feStallSeq
        }
      } else {
        // The oldest of: an instruction whose lane work is done, waiting for the ring; one refused something.
        let waiting = NONE
        for (let i = 0; i < (nActive[l] as number) && waiting === NONE; i++) {
          const k = active[l * SLOTS + i] as number
          if ((beats[k * L + l] as number) >= words && (laneValue[k * L + l] as number) >= 0) waiting = k
        }
        if (waiting !== NONE && (oldest === NONE || (sSeq[waiting] as number) < (sSeq[oldest] as number))) stall(l, c, R_RING, sSeq[waiting] as number)
        else if (oldest !== NONE) stall(l, c, noteReason[oldest * L + l] as number, sSeq[oldest] as number)
        else {
          // An instruction dispatched and not done in this lane holds it (a reduction: for the ring); else the front end.
          for (let q = first; q < dispatched && reason === NONE; q++) {
            const k = q % SLOTS
            if (sSeq[k] === q && (sDispatch[k] as number) < c && laneDone[k * L + l] === 0) {
              reason = R_RING
              seq = q
            }
          }
          if (reason === NONE) {
            reason = feStall
            seq = feStallSeq
          }
        }
      }
      if (reason !== NONE) {
        stall(l, c, reason, seq)
        opStalls[seq * REASONS + reason] = (opStalls[seq * REASONS + reason] as number) + 1
      }
      slotsUsed[l] = (slotsUsed[l] as number) - (slotsReleased[l] as number)
      slotsReleased[l] = 0
    }
    c++
  }
  return { cycles: c, busy, usageRows: usage.rows(), stallRows: stalls.rows(), stallCycles: stallTotals }
}
