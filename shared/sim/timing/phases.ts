/**
 * Each instruction kind's steps, called through a switch on its kind. A call
 * site that sees all six instruction classes goes megamorphic in V8: a process
 * that had timed every kind ran the long stream 1.6 times slower than a fresh
 * one (docs/model.md "Speed"). A call site per class sees one class, so V8
 * keeps it fast and can inline it.
 */
import type { InstState } from './inst'
import { KIND } from './inst'
import type { LoadInst, StoreInst } from './memory'
import type { PermutationInst } from './permutation'
import type { OrderedReductionInst, ReductionInst } from './reduction'
import type { UnitInst } from './units'

// Copied once: under tsx's module transform each use of an imported binding is a getter call.
const UNIT: number = KIND.unit
const LOAD: number = KIND.load
const STORE: number = KIND.store
const REDUCTION: number = KIND.reduction
const ORDERED: number = KIND.orderedReduction
const PERMUTATION: number = KIND.permutation

/** Write-back in `lane` (element-wise instructions share InstState.write; stores write no register). */
export function writeStep(st: InstState, lane: number, c: number): void {
  const k = st.kind
  if (k === UNIT) st.write(lane, c)
  else if (k === LOAD) (st.owner as LoadInst).write(lane, c)
  else if (k === REDUCTION) (st.owner as ReductionInst).write(lane, c)
  else if (k === ORDERED) (st.owner as OrderedReductionInst).write(lane, c)
  else if (k === PERMUTATION) (st.owner as PermutationInst).write(lane, c)
}

/** Beats in `lane`. */
export function execStep(st: InstState, lane: number, c: number): void {
  const k = st.kind
  if (k === UNIT) (st.owner as UnitInst).exec(lane, c)
  else if (k === REDUCTION) (st.owner as ReductionInst).exec(lane, c)
  else if (k === ORDERED) (st.owner as OrderedReductionInst).exec(lane, c)
  // Memory instructions and permutations do their work outside the lanes (globalStep).
}

/** Operand reads in `lane` (only permutations add to InstState.read). */
export function readStep(st: InstState, lane: number, c: number): void {
  if (st.kind === PERMUTATION) (st.owner as PermutationInst).read(lane, c)
  else st.read(lane, c)
}

/** The lane may start: reads from this cycle on (a permutation also engages its datapath). */
export function startLaneStep(st: InstState, lane: number, c: number): void {
  if (st.kind === PERMUTATION) (st.owner as PermutationInst).startLane(lane, c)
  else st.startLane(lane, c)
}

/** Whether the lane still has work for the instruction (an ordered reduction's running value may yet pass through it). */
export function pendingStep(st: InstState, lane: number): boolean {
  if (st.kind === ORDERED) return (st.owner as OrderedReductionInst).pending(lane)
  return st.laneDone[lane] !== 1
}

/** Whether the instruction has a step outside the lanes: every kind but element-wise work. */
export function hasGlobalStep(st: InstState): boolean {
  return st.kind !== UNIT
}

/** The step outside the lanes (memory unit, ring) of an instruction that has one (hasGlobalStep). */
export function globalStep(st: InstState, c: number): void {
  const k = st.kind
  if (k === LOAD) (st.owner as LoadInst).global(c)
  else if (k === STORE) (st.owner as StoreInst).global(c)
  else if (k === REDUCTION) (st.owner as ReductionInst).global(c)
  else if (k === ORDERED) (st.owner as OrderedReductionInst).global(c)
  else (st.owner as PermutationInst).global(c)
}
