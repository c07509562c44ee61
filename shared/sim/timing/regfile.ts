/**
 * The register-file slices of the lanes: when each word of each physical
 * register can be read (chaining), and the bank ports granted in the current
 * cycle. Word w of physical register p sits in bank (p + w) mod rfBanks.
 */
import type { Derived } from './config'

/** A word that is not written yet. */
export const PENDING = 0x7fffffff

export class RegFile {
  readonly lanes: number
  readonly banks: number
  readonly ports: number
  readonly wpr: number
  /** log2 of `wpr` when it is a power of two (the usual case), else -1: word w sits in register w >> wprShift. */
  readonly wprShift: number
  /** [phys][word]: the bank of word `word` of physical register `phys`, looked up (a division per word read costs in the per-cycle paths). */
  readonly bankOfWord: Uint8Array
  /** [phys][lane][word]: first cycle the word may be read. */
  readonly ready: Int32Array
  /** [lane][bank]: ports used in cycle `portCycle[lane][bank]`. */
  private readonly portUse: Uint8Array
  private readonly portCycle: Int32Array

  constructor(d: Derived, physRegs: number) {
    this.lanes = d.lanes
    this.banks = d.banks
    this.ports = d.ports
    this.wpr = d.wordsPerRegLane
    this.wprShift = Number.isInteger(Math.log2(this.wpr)) ? Math.log2(this.wpr) : -1
    this.bankOfWord = new Uint8Array(physRegs * this.wpr)
    for (let p = 0; p < physRegs; p++) for (let w = 0; w < this.wpr; w++) this.bankOfWord[p * this.wpr + w] = (p + w) % this.banks
    this.ready = new Int32Array(physRegs * d.lanes * d.wordsPerRegLane) // initial registers readable from cycle 0
    this.portUse = new Uint8Array(d.lanes * d.banks)
    this.portCycle = new Int32Array(d.lanes * d.banks).fill(-1)
  }

  /** Asks for a port of `bank` in `lane` in cycle c; true when granted. */
  grant(lane: number, bank: number, c: number): boolean {
    const k = lane * this.banks + bank
    if (this.portCycle[k] !== c) {
      this.portCycle[k] = c
      this.portUse[k] = 0
    }
    const used = this.portUse[k] ?? 0
    if (used >= this.ports) return false
    this.portUse[k] = used + 1
    return true
  }

  /** Marks every word of physical register p unreadable (a new writer was renamed onto it). */
  invalidate(p: number): void {
    const n = this.lanes * this.wpr
    this.ready.fill(PENDING, p * n, p * n + n)
  }

  /** Makes every still-pending word of p readable from cycle c (tail words, or chaining off). */
  release(p: number, c: number): void {
    const n = this.lanes * this.wpr
    for (let i = p * n; i < p * n + n; i++) if (this.ready[i] === PENDING) this.ready[i] = c
  }
}
