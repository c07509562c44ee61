/**
 * Readable lines for a refused import: the server's error body
 * (uploadErrorBodySchema) turned into "line 3, column 9: message" lines, so a
 * bad file says what is wrong and where.
 *
 * @example
 *   uploadProblems({ error: { code: 'validation_failed', message: 'The assembly has errors' }, diagnostics: [{ line: 3, column: 9, code: 'x', message: 'unknown register' }] })
 *   // { message: 'The assembly has errors', places: ['line 3, column 9: unknown register'], functions: [] }
 */
import { uploadErrorBodySchema, type ElfFunction, type FileDiagnostic } from '@shared/schemas/upload'

export interface UploadProblems {
  message: string
  places: string[]
  /** An ELF sent without a chosen function: the ones to choose from. */
  functions: ElfFunction[]
}

export function placeOf(d: FileDiagnostic): string {
  if (d.line !== undefined) return d.column !== undefined ? `line ${d.line}, column ${d.column}` : `line ${d.line}`
  if (d.offset !== undefined) return `byte ${d.offset} (0x${d.offset.toString(16)})`
  return ''
}

/** Null when the body is not an upload error of ours (then the ApiError's message is all there is). */
export function uploadProblems(body: unknown): UploadProblems | null {
  const parsed = uploadErrorBodySchema.safeParse(body)
  if (!parsed.success) return null
  const { error, diagnostics = [], functions = [] } = parsed.data
  const places = diagnostics.map((d) => {
    const where = placeOf(d)
    return where ? `${where}: ${d.message}` : d.message
  })
  for (const [field, msg] of Object.entries(error.fields ?? {})) places.push(`${field}: ${msg}`)
  return { message: error.message, places, functions }
}
