/**
 * Client-side checks of a file before it is sent for import: the same limits
 * the server enforces (shared/schemas/upload.ts), said before the upload
 * starts, and the kind guessed from the name and first bytes so the page can
 * ask for an ELF function or show a bundle's titles. The server decides in
 * the end; this only spares a round trip for what is certainly wrong.
 *
 * @example
 *   checkUpload({ name: 'saxpy.s', size: 120 }, new Uint8Array([0x2e, 0x74])) // { ok: true, kind: 'asm' }
 */
import { UPLOAD_MAX_BYTES, type UploadKind } from '@shared/schemas/upload'

export interface FileFacts {
  name: string
  size: number
}

export type UploadCheck = { ok: true; kind: UploadKind } | { ok: false; message: string }

/** ELF magic (System V ABI, ELF header e_ident[EI_MAG0..3]). */
const ELF_MAGIC = [0x7f, 0x45, 0x4c, 0x46]

export function formatBytes(n: number): string {
  if (n < 1024) return `${n} bytes`
  if (n < 1024 * 1024) return `${(n / 1024).toFixed(1)} KiB`
  return `${(n / (1024 * 1024)).toFixed(1)} MiB`
}

function startsWith(bytes: Uint8Array, prefix: number[]): boolean {
  return prefix.every((b, i) => bytes[i] === b)
}

/** Guesses the kind from the first bytes (at least 512 of them, or the whole file) and the name. */
export function guessKind(name: string, head: Uint8Array): UploadKind | null {
  if (startsWith(head, ELF_MAGIC)) return 'elf'
  const lower = name.toLowerCase()
  const text = new TextDecoder('utf-8', { fatal: false }).decode(head)
  if (lower.endsWith('.json') || /^\s*\{/.test(text)) return 'bundle'
  // objdump -d prints "<file>:     file format elf64-littleriscv" and "Disassembly of section".
  if (/file format elf|Disassembly of section/.test(text) || lower.endsWith('.dump') || lower.endsWith('.objdump')) return 'objdump'
  if (lower.endsWith('.s') || lower.endsWith('.asm')) return 'asm'
  // A NUL byte in the head means binary data that is not an ELF file.
  if (head.includes(0)) return null
  return 'asm'
}

export function checkUpload(file: FileFacts, head: Uint8Array): UploadCheck {
  if (file.size === 0) return { ok: false, message: `${file.name} is empty.` }
  if (file.size > UPLOAD_MAX_BYTES) {
    return { ok: false, message: `${file.name} is ${formatBytes(file.size)}; files of at most ${formatBytes(UPLOAD_MAX_BYTES)} can be imported.` }
  }
  const kind = guessKind(file.name, head)
  if (!kind) {
    return { ok: false, message: `${file.name} is neither text (.s assembly, objdump -d listing, scenario bundle) nor a RISC-V ELF file.` }
  }
  return { ok: true, kind }
}
