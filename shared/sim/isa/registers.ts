/**
 * Register names: x and f registers by number and by ABI name (RISC-V ABI
 * specification, "Register Convention"), vector registers v0..v31.
 * Canonical text uses the ABI names, as `objdump -d` prints them.
 */

export const X_ABI = [
  'zero', 'ra', 'sp', 'gp', 'tp', 't0', 't1', 't2',
  's0', 's1', 'a0', 'a1', 'a2', 'a3', 'a4', 'a5',
  'a6', 'a7', 's2', 's3', 's4', 's5', 's6', 's7',
  's8', 's9', 's10', 's11', 't3', 't4', 't5', 't6',
] as const

export const F_ABI = [
  'ft0', 'ft1', 'ft2', 'ft3', 'ft4', 'ft5', 'ft6', 'ft7',
  'fs0', 'fs1', 'fa0', 'fa1', 'fa2', 'fa3', 'fa4', 'fa5',
  'fa6', 'fa7', 'fs2', 'fs3', 'fs4', 'fs5', 'fs6', 'fs7',
  'fs8', 'fs9', 'fs10', 'fs11', 'ft8', 'ft9', 'ft10', 'ft11',
] as const

export type RegFile = 'x' | 'f' | 'v'

const xByName = new Map<string, number>()
const fByName = new Map<string, number>()
X_ABI.forEach((n, i) => xByName.set(n, i))
F_ABI.forEach((n, i) => fByName.set(n, i))
xByName.set('fp', 8) // the ABI's second name for s0
for (let i = 0; i < 32; i++) {
  xByName.set(`x${i}`, i)
  fByName.set(`f${i}`, i)
}

/** The register number for `name` in `file`, or undefined when it is not one. */
export function parseRegister(file: RegFile, name: string): number | undefined {
  const n = name.toLowerCase()
  if (file === 'x') return xByName.get(n)
  if (file === 'f') return fByName.get(n)
  const m = /^v([0-9]|[12][0-9]|3[01])$/.exec(n)
  return m ? Number(m[1]) : undefined
}

/** Which register file, if any, `name` belongs to (for "expected an x register, found f3"). */
export function registerFileOf(name: string): RegFile | undefined {
  for (const f of ['x', 'f', 'v'] as const) if (parseRegister(f, name) !== undefined) return f
  return undefined
}

export function registerName(file: RegFile, n: number): string {
  if (file === 'x') return X_ABI[n] ?? `x${n}`
  if (file === 'f') return F_ABI[n] ?? `f${n}`
  return `v${n}`
}
