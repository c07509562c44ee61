/**
 * Register renaming (handbook section 3): each destination register takes a
 * free physical register at dispatch; the old mapping is freed once its new
 * writer has finished and every reader of the old mapping has finished reading.
 */
export class Renamer {
  private readonly map = new Int32Array(32)
  private readonly free: number[] = []
  private readonly readers: Int32Array
  private readonly superseded: Uint8Array
  /** 1 while the instruction that writes p is still writing (a later writer may finish first). */
  private readonly writing: Uint8Array

  constructor(physRegs: number) {
    for (let a = 0; a < 32; a++) this.map[a] = a
    // Lowest numbers first, so that small programs see predictable banks.
    for (let p = physRegs - 1; p >= 32; p--) this.free.push(p)
    this.readers = new Int32Array(physRegs)
    this.superseded = new Uint8Array(physRegs)
    this.writing = new Uint8Array(physRegs)
  }

  get freeCount(): number {
    return this.free.length
  }

  lookup(arch: number): number {
    return this.map[arch & 31] ?? 0
  }

  /** Maps arch to a fresh physical register; returns [new, old]. Caller checked freeCount. */
  rename(arch: number): [number, number] {
    const p = this.free.pop()
    if (p === undefined) throw new Error('rename without a free physical register')
    const old = this.map[arch & 31] ?? 0
    this.map[arch & 31] = p
    this.superseded[p] = 0
    this.writing[p] = 1
    return [p, old]
  }

  addReader(p: number): void {
    this.readers[p] = (this.readers[p] ?? 0) + 1
  }

  dropReader(p: number): void {
    this.readers[p] = (this.readers[p] ?? 0) - 1
    this.maybeFree(p)
  }

  /** The writer that replaced p's mapping has finished. */
  supersede(p: number): void {
    this.superseded[p] = 1
    this.maybeFree(p)
  }

  /** The writer of p has finished in every lane. */
  written(p: number): void {
    this.writing[p] = 0
    this.maybeFree(p)
  }

  private maybeFree(p: number): void {
    if (this.superseded[p] === 1 && this.readers[p] === 0 && this.writing[p] === 0) {
      this.superseded[p] = 0
      this.free.push(p)
    }
  }
}
