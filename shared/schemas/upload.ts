/**
 * Uploads: files brought in to make scenarios. The original file is kept
 * (bytes in PostgreSQL, with its SHA-256) and linked to what it produced.
 *
 * POST /api/workspaces/:id/uploads/inspect (multipart: file[, kind]) -> UploadInspection; nothing is stored
 * POST /api/workspaces/:id/uploads (multipart: file[, kind, function, title, preset]) -> 201 { upload, scenarios }
 */
import { z } from 'zod'
import { scenarioSummarySchema } from './scenario'
import { personSchema } from './scenario'
import { errorCodeSchema } from './errors'
import { PRESET_IDS } from '../sim/presets'

/** Largest file accepted. */
export const UPLOAD_MAX_BYTES = 4 * 1024 * 1024
/** Most instructions one import may bring in (an assembled program, a listing or an ELF function). */
export const IMPORT_MAX_INSTRUCTIONS = 50_000

export const UPLOAD_KINDS = ['asm', 'objdump', 'elf', 'bundle'] as const
export type UploadKind = (typeof UPLOAD_KINDS)[number]

/** Multipart text fields beside `file`. `kind` is detected from the content and name when absent. */
export const uploadFieldsSchema = z
  .object({
    kind: z.enum(UPLOAD_KINDS, { error: `kind is one of ${UPLOAD_KINDS.join(', ')}` }).optional(),
    /** ELF only: the function (symbol) to import. */
    function: z.string().min(1).max(200).optional(),
    /** Title of the scenario made (not for bundles, which carry their own). */
    title: z.string().trim().min(1).max(200).optional(),
    /** The preset the imported program runs on (not for bundles); the workspace's default preset when absent. */
    preset: z.enum(PRESET_IDS, { error: `preset is one of ${PRESET_IDS.join(', ')}` }).optional(),
  })
  .strict()
export type UploadFields = z.output<typeof uploadFieldsSchema>

export const elfFunctionSchema = z.object({
  name: z.string(),
  address: z.number().int(),
  /** Bytes. */
  size: z.number().int(),
  instructions: z.number().int(),
})
export type ElfFunction = z.infer<typeof elfFunctionSchema>

export const uploadInspectionSchema = z.object({
  kind: z.enum(UPLOAD_KINDS),
  fileName: z.string(),
  size: z.number().int(),
  /** ELF: the functions of the symbol table, in address order. */
  functions: z.array(elfFunctionSchema).optional(),
  /** Bundles: the titles of the scenarios inside. */
  scenarios: z.array(z.string()).optional(),
})
export type UploadInspection = z.infer<typeof uploadInspectionSchema>

export const uploadSchema = z.object({
  id: z.uuid(),
  fileName: z.string(),
  kind: z.enum(UPLOAD_KINDS),
  mediaType: z.string(),
  size: z.number().int(),
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  uploadedBy: personSchema,
  createdAt: z.iso.datetime(),
  scenarioIds: z.array(z.uuid()),
})
export type Upload = z.infer<typeof uploadSchema>

export const uploadResponseSchema = z.object({ upload: uploadSchema, scenarios: z.array(scenarioSummarySchema) })

/** A problem at a place in the file: line and column for text, byte offset for binaries. */
export const fileDiagnosticSchema = z.object({
  line: z.number().int().optional(),
  column: z.number().int().optional(),
  offset: z.number().int().optional(),
  code: z.string(),
  message: z.string(),
})
export type FileDiagnostic = z.infer<typeof fileDiagnosticSchema>

/** The 400/413 of a refused upload: the usual error, plus where in the file. */
export const uploadErrorBodySchema = z.object({
  error: z.object({ code: errorCodeSchema, message: z.string(), fields: z.record(z.string(), z.string()).optional() }),
  diagnostics: z.array(fileDiagnosticSchema).optional(),
  /** ELF without a chosen function: the ones to choose from. */
  functions: z.array(elfFunctionSchema).optional(),
})
export type UploadErrorBody = z.infer<typeof uploadErrorBodySchema>
