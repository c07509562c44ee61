/**
 * The CSRs a user-mode program of the F, D and V extensions reads or writes,
 * by name and number (RISC-V privileged specification, "CSR Listing"; V 1.0
 * section 3 for vstart 0x008, vxsat 0x009, vxrm 0x00a, vcsr 0x00f, vl 0xc20,
 * vtype 0xc21, vlenb 0xc22), plus the user counters.
 */
export const CSR_NUMBERS: Readonly<Record<string, number>> = {
  fflags: 0x001, frm: 0x002, fcsr: 0x003,
  vstart: 0x008, vxsat: 0x009, vxrm: 0x00a, vcsr: 0x00f,
  cycle: 0xc00, time: 0xc01, instret: 0xc02,
  vl: 0xc20, vtype: 0xc21, vlenb: 0xc22,
}

const NAMES = new Map(Object.entries(CSR_NUMBERS).map(([n, v]) => [v, n]))

export function csrNumber(name: string): number | undefined {
  const n = name.toLowerCase()
  return Object.hasOwn(CSR_NUMBERS, n) ? CSR_NUMBERS[n] : undefined
}

/** The name objdump prints for a CSR, or its number in hex. */
export function csrName(n: number): string {
  return NAMES.get(n) ?? `0x${n.toString(16)}`
}
