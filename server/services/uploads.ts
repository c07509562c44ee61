/**
 * Imports: a `.s` file, an `objdump -d` listing, a RISC-V ELF function or a
 * scenario bundle becomes scenarios. The file is read and checked completely
 * first; only then, in one transaction, are the Upload (the original bytes
 * and their SHA-256) and what it produced written. A bad file leaves nothing.
 */
import crypto from 'node:crypto'
import path from 'node:path'
import { bundleSchema, type Bundle } from '../../shared/schemas/bundle'
import type { ScenarioContent } from '../../shared/schemas/scenario'
import { SCENARIO_PROGRAM_MAX_LENGTH, scenarioContentSchema } from '../../shared/schemas/scenario'
import { IMPORT_MAX_INSTRUCTIONS, type FileDiagnostic, type UploadFields, type Upload as UploadDto, type UploadInspection, type UploadKind } from '../../shared/schemas/upload'
import { parseMachine, type Machine } from '../../shared/schemas/machine'
import { assemble } from '../../shared/sim/isa/assembler'
import { DEFAULT_PRESET_ID, findPreset } from '../../shared/sim/presets'
import { parseObjdump } from '../../shared/sim/isa/objdump'
import type { SimDiagnostic } from '../../shared/sim/isa/types'
import type { AppContext } from '../context'
import type { ErrorCode } from '../../shared/schemas/errors'
import { DetailedApiError } from '../http/detailed-error'
import { ApiError } from '../http/errors'
import { badTextFields } from '../http/text-guard'
import { issuesToFields } from '../http/validate'
import { Scenario, Upload, Workspace, type User } from '../models'
import { ElfError, readElf } from './elf/reader'
import { decodeFunction, listFunctions } from './elf/import'
import { executableToAssembly, WHOLE_EXECUTABLE, wholeExecutableChoice } from './elf/program'
import { importBundle, summarizeBundle } from './scenario-bundles'
import { createScenario } from './scenarios'
import { instructionsToAssembly } from './uploads-asm'

export interface ReceivedFile {
  originalname: string
  mimetype: string
  size: number
  buffer: Buffer
}

const invalid = (message: string, diagnostics: FileDiagnostic[] = [], extra: Record<string, unknown> = {}) =>
  new DetailedApiError(400, 'invalid_file', message, { diagnostics, ...extra })

const fromSim = (d: SimDiagnostic): FileDiagnostic => ({ line: d.line, column: d.column, code: d.code, message: d.message })

const ASM_EXT = new Set(['.s', '.asm'])
const OBJDUMP_EXT = new Set(['.txt', '.dump', '.objdump', '.lst', '.dis'])
const OBJDUMP_ROW = /^\s*[0-9a-f]+:\s+[0-9a-f]{4,8}\s/im

/** The file as UTF-8 text, or a 400 naming the first byte that is not text. */
function asText(file: ReceivedFile): string {
  const bad = file.buffer.findIndex((b) => b === 0 || (b < 0x20 && b !== 0x09 && b !== 0x0a && b !== 0x0d))
  if (bad >= 0) throw invalid(`${file.originalname} is not a text file: byte ${bad} is 0x${(file.buffer[bad] ?? 0).toString(16).padStart(2, '0')}`, [{ offset: bad, code: 'binary', message: 'a control byte in a text file' }])
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(file.buffer).replace(/^\uFEFF/, '')
  } catch {
    throw invalid(`${file.originalname} is not UTF-8 text`, [{ code: 'encoding', message: 'not valid UTF-8' }])
  }
}

export function detectKind(file: ReceivedFile, requested?: UploadKind): UploadKind {
  if (requested) return requested
  const b = file.buffer
  if (b.length >= 4 && b[0] === 0x7f && b[1] === 0x45 && b[2] === 0x4c && b[3] === 0x46) return 'elf'
  const ext = path.extname(file.originalname).toLowerCase()
  if (ext === '.json') return 'bundle'
  if (ASM_EXT.has(ext)) return 'asm'
  if (OBJDUMP_EXT.has(ext)) return 'objdump'
  const text = asText(file)
  if (/^\s*\{/.test(text)) return 'bundle'
  if (OBJDUMP_ROW.test(text)) return 'objdump'
  throw invalid(`Chimeline cannot tell what ${file.originalname} is: upload a .s assembly file, an objdump -d listing (.txt), a RISC-V ELF file or a scenario bundle (.json), or name the kind`)
}

/** Line and column of a character offset. */
function position(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, offset).split('\n')
  return { line: before.length, column: (before[before.length - 1]?.length ?? 0) + 1 }
}

function readBundle(file: ReceivedFile): Bundle {
  const text = asText(file)
  let json: unknown
  try {
    json = JSON.parse(text)
  } catch (err) {
    const at = /position (\d+)/.exec((err as Error).message)
    const where = at ? position(text, Number(at[1])) : {}
    throw invalid(`${file.originalname} is not valid JSON: ${(err as Error).message}`, [{ ...where, code: 'json', message: (err as Error).message }])
  }
  const badText = badTextFields(json)
  const [firstBad] = Object.entries(badText)
  if (firstBad) throw new DetailedApiError(400, 'invalid_file', `${file.originalname}: ${firstBad[0]}: ${firstBad[1]}`, { diagnostics: [] }, badText)
  const parsed = bundleSchema.safeParse(json)
  if (!parsed.success) {
    const fields = issuesToFields(parsed.error.issues)
    const [first] = Object.entries(fields)
    throw new DetailedApiError(400, 'invalid_file', `${file.originalname} is not a Chimeline scenario bundle (formatVersion 1): ${first?.[0]}: ${first?.[1]}`, { diagnostics: [] }, fields)
  }
  return parsed.data
}

function elfProblem(file: ReceivedFile, err: unknown): never {
  if (err instanceof ElfError) throw invalid(`${file.originalname}: ${err.message}`, [{ offset: err.offset, code: err.code, message: err.message }])
  throw err
}

const baseTitle = (file: ReceivedFile) => path.basename(file.originalname).replace(/\.[^.]+$/, '').slice(0, 200) || 'Imported program'

/** The content of an import; a program made longer than a scenario may keep is a 400 naming the limit. */
function contentFor(file: ReceivedFile, title: string, program: string): ScenarioContent {
  const parsed = scenarioContentSchema.safeParse({ title, program, description: '' })
  if (parsed.success) return parsed.data
  const fields = issuesToFields(parsed.error.issues)
  const why = fields.program
    ? `the program it makes has ${program.length.toLocaleString('en')} characters; a scenario's program has at most ${SCENARIO_PROGRAM_MAX_LENGTH.toLocaleString('en')} characters (import a smaller part)`
    : Object.entries(fields).map(([k, v]) => `${k}: ${v}`).join('; ')
  throw new DetailedApiError(400, 'invalid_file', `${file.originalname}: ${why}`, { diagnostics: [] }, fields)
}

/** Reads a file fully: the content of one scenario, or a bundle. Throws a 400 that says where on any problem. */
function readUpload(file: ReceivedFile, kind: UploadKind, fields: UploadFields): { content: ScenarioContent } | { bundle: Bundle } {
  const title = fields.title ?? baseTitle(file)
  switch (kind) {
    case 'asm': {
      const text = asText(file)
      const r = assemble(text, { maxInstructions: IMPORT_MAX_INSTRUCTIONS })
      if (!r.ok) {
        const first = r.errors[0] as SimDiagnostic
        throw invalid(`${file.originalname} line ${first.line}, column ${first.column}: ${first.message}${r.errors.length > 1 ? ` (and ${r.errors.length - 1} more)` : ''}`, r.errors.map(fromSim))
      }
      return { content: contentFor(file, title, text) }
    }
    case 'objdump': {
      const r = parseObjdump(asText(file), { maxInstructions: IMPORT_MAX_INSTRUCTIONS })
      if (!r.ok) {
        const first = r.errors[0] as SimDiagnostic
        throw invalid(`${file.originalname} line ${first.line}, column ${first.column}: ${first.message}`, r.errors.map(fromSim))
      }
      const asm = instructionsToAssembly(r.program.instructions, `# Imported from ${path.basename(file.originalname)} (an objdump -d listing)`)
      if (!asm.ok) throw invalid(`${file.originalname}: ${asm.message}`, [{ code: 'reassemble', message: asm.message }])
      return { content: contentFor(file, title, asm.text) }
    }
    case 'elf': {
      let functions
      try {
        functions = elfChoices(file.buffer)
      } catch (err) {
        elfProblem(file, err)
      }
      if (!fields.function) throw invalid(`${file.originalname} is an ELF file: choose one of its ${functions.length} function(s) to import`, [], { functions })
      if (fields.function === WHOLE_EXECUTABLE) {
        let text
        try {
          text = executableToAssembly(readElf(file.buffer), path.basename(file.originalname), IMPORT_MAX_INSTRUCTIONS)
        } catch (err) {
          elfProblem(file, err)
        }
        return { content: contentFor(file, title, text) }
      }
      let decoded
      try {
        decoded = decodeFunction(file.buffer, fields.function, IMPORT_MAX_INSTRUCTIONS)
      } catch (err) {
        elfProblem(file, err)
      }
      const asm = instructionsToAssembly(decoded.instructions, `# Imported from ${path.basename(file.originalname)}: function ${decoded.name} (RISC-V ELF)`)
      if (!asm.ok) throw invalid(`${file.originalname}: ${asm.message}`, [{ code: 'reassemble', message: asm.message }])
      return { content: contentFor(file, fields.title ?? decoded.name, asm.text) }
    }
    case 'bundle':
      return { bundle: readBundle(file) }
  }
}

/**
 * What an ELF file offers to import: an executable's whole program first
 * (code, data and symbols, entered at its entry point), then each function
 * of the symbol table.
 */
function elfChoices(bytes: Uint8Array) {
  const elf = readElf(bytes)
  const whole = wholeExecutableChoice(elf)
  return whole ? [whole, ...listFunctions(elf)] : listFunctions(elf)
}

/** The machine an imported program starts on: the preset the upload names, else the workspace's default preset. */
async function importMachine(workspaceId: string, presetId: string | undefined): Promise<Machine> {
  const id = presetId ?? (await Workspace.findByPk(workspaceId))?.defaultPreset ?? DEFAULT_PRESET_ID
  return parseMachine(findPreset(id)?.machine ?? {})
}

/** What a file holds, without storing anything (the ELF function list for the chooser). */
export function inspectUpload(file: ReceivedFile, fields: UploadFields): UploadInspection {
  const kind = detectKind(file, fields.kind)
  const base = { kind, fileName: file.originalname, size: file.size }
  if (kind === 'elf') {
    try {
      return { ...base, functions: elfChoices(file.buffer) }
    } catch (err) {
      elfProblem(file, err)
    }
  }
  const read = readUpload(file, kind, fields)
  return 'bundle' in read ? { ...base, scenarios: read.bundle.scenarios.map((s) => s.versions[s.versions.length - 1]?.content.title ?? '') } : base
}

export function uploadDto(upload: Upload, uploader: User | null, scenarioIds: string[]): UploadDto {
  return {
    id: upload.id,
    fileName: upload.fileName,
    kind: upload.kind,
    mediaType: upload.mediaType,
    size: upload.size,
    sha256: upload.sha256,
    uploadedBy: { id: uploader?.id ?? null, name: uploader?.name ?? 'a former member' },
    createdAt: upload.createdAt.toISOString(),
    scenarioIds,
  }
}

/** What reading a file on the work pool gives back; an error travels as its parts, since threads clone no classes. */
export type UploadWork<T> = { ok: true; value: T } | { ok: false; status: number; code: ErrorCode; message: string; fields?: Record<string, string>; details: Record<string, unknown> }

/**
 * The reading of an upload (assembling up to 50,000 instructions, parsing a
 * 4 MiB bundle, decoding an ELF), as a work-pool task: `inspect` gives what
 * the file holds, `read` the content or bundle to import.
 */
export function uploadWork(input: { file: ReceivedFile; fields: UploadFields; mode: 'inspect' | 'read' }): UploadWork<UploadInspection | { kind: UploadKind; read: ReturnType<typeof readUpload> }> {
  // A Buffer arrives on the thread as a plain Uint8Array.
  const file = { ...input.file, buffer: Buffer.from(input.file.buffer.buffer, input.file.buffer.byteOffset, input.file.buffer.byteLength) }
  try {
    if (input.mode === 'inspect') return { ok: true, value: inspectUpload(file, input.fields) }
    const kind = detectKind(file, input.fields.kind)
    return { ok: true, value: { kind, read: readUpload(file, kind, input.fields) } }
  } catch (err) {
    if (!(err instanceof ApiError)) throw err
    return { ok: false, status: err.status, code: err.code, message: err.message, fields: err.fields, details: err instanceof DetailedApiError ? err.details : {} }
  }
}

/** The value of an upload task, or its error thrown again on this side. */
export function fromWork<T>(outcome: UploadWork<unknown>): T {
  if (outcome.ok) return outcome.value as T
  throw new DetailedApiError(outcome.status, outcome.code, outcome.message, outcome.details, outcome.fields)
}

export async function importUpload(ctx: AppContext, user: User, workspaceId: string, file: ReceivedFile, fields: UploadFields): Promise<{ upload: Upload; scenarios: Scenario[] }> {
  const { kind, read } = fromWork<{ kind: UploadKind; read: ReturnType<typeof readUpload> }>(await ctx.work.run('upload', { file, fields, mode: 'read' }, workspaceId, user.id))
  if ('content' in read) read.content.machine = await importMachine(workspaceId, fields.preset)
  // Runs first, on the pool and outside the transaction: a bundle's recorded figures are not trusted.
  const run = 'content' in read ? await ctx.runs.summarize(read.content, workspaceId, user.id) : undefined
  const bundleRuns = 'bundle' in read ? await summarizeBundle(ctx, user, workspaceId, read.bundle, file.originalname) : []
  return ctx.sequelize.transaction(async (transaction) => {
    const upload = await Upload.create(
      {
        workspaceId,
        uploadedById: user.id,
        fileName: path.basename(file.originalname).slice(0, 255),
        kind,
        mediaType: (file.mimetype || 'application/octet-stream').slice(0, 100),
        size: file.size,
        bytes: file.buffer,
        sha256: crypto.createHash('sha256').update(file.buffer).digest('hex'),
      },
      { transaction },
    )
    const scenarios =
      'content' in read
        ? [await createScenario(ctx, user, workspaceId, { content: read.content, message: `Imported from ${upload.fileName}` }, { uploadId: upload.id, transaction, run })]
        : await importBundle(user, workspaceId, read.bundle, bundleRuns, { uploadId: upload.id, transaction })
    return { upload, scenarios }
  })
}
