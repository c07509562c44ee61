import type { Request, Response } from 'express'
import multer from 'multer'
import { UPLOAD_MAX_BYTES, uploadFieldsSchema, type UploadFields } from '../../../shared/schemas/upload'
import { access, currentMembership, currentUser } from '../../auth/access'
import type { AppContext } from '../../context'
import { ApiError, errors } from '../../http/errors'
import type { SecureRouter } from '../../http/secure-router'
import { assertGoodText, badTextFields } from '../../http/text-guard'
import { issuesToFields } from '../../http/validate'
import { summaryDto } from '../../services/scenarios'
import { fromWork, importUpload, uploadDto, type ReceivedFile } from '../../services/uploads'

export const uploadPermissions = { inspect: ['owner', 'editor'], import: ['owner', 'editor'] } as const

const receive = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: UPLOAD_MAX_BYTES, files: 1, fields: 10, fieldSize: 1024 },
}).single('file')

/** Runs multer after authorization (so strangers cannot make the server buffer files) and checks the fields. */
async function received(req: Request, res: Response): Promise<{ file: ReceivedFile; fields: UploadFields }> {
  await new Promise<void>((resolve, reject) => {
    receive(req, res, (err: unknown) => {
      if (!err) return resolve()
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') {
          return reject(new ApiError(413, 'payload_too_large', `The file is larger than the upload limit of ${UPLOAD_MAX_BYTES / (1024 * 1024)} MiB`))
        }
        return reject(errors.validation({ [err.field ?? 'file']: err.message }, 'The upload form is not valid: send one file in the field "file"'))
      }
      // busboy's own errors: a multipart type without a boundary, or a body that ends mid-part.
      const message = String((err as { message?: unknown }).message ?? '')
      if (/boundary not found/i.test(message)) return reject(errors.validation({ 'Content-Type': 'multipart/form-data needs a boundary parameter (RFC 7578, section 4.1)' }, 'The upload form is not valid'))
      if (/^(Multipart|Unexpected end of form|Malformed)/i.test(message)) return reject(errors.validation({ file: `The multipart body is cut short or malformed: ${message}` }, 'The upload form is not valid'))
      reject(err)
    })
  })
  if (!req.file) throw errors.validation({ file: 'Choose a file to upload (multipart field "file")' })
  assertGoodText(req.body)
  const parsed = uploadFieldsSchema.safeParse({ ...(req.body as object) })
  if (!parsed.success) throw errors.validation(issuesToFields(parsed.error.issues))
  // multer gives the name as latin1; browsers send UTF-8.
  const originalname = Buffer.from(req.file.originalname, 'latin1').toString('utf8')
  if (badTextFields(originalname).body) throw errors.validation({ file: `The file name: ${badTextFields(originalname).body}` })
  return { file: { originalname, mimetype: req.file.mimetype, size: req.file.size, buffer: req.file.buffer }, fields: parsed.data }
}

export function uploadRoutes(ctx: AppContext, r: SecureRouter): void {
  r.post('/workspaces/:id/uploads/inspect', { access: access.workspace(uploadPermissions.inspect) }, async (req, res) => {
    const { file, fields } = await received(req, res)
    res.json(fromWork(await ctx.work.run('upload', { file, fields, mode: 'inspect' }, currentMembership(req).workspaceId, currentUser(req).id)))
  })

  r.post('/workspaces/:id/uploads', { access: access.workspace(uploadPermissions.import) }, async (req, res) => {
    const { file, fields } = await received(req, res)
    const user = currentUser(req)
    const { upload, scenarios } = await importUpload(ctx, user, currentMembership(req).workspaceId, file, fields)
    res.status(201).json({ upload: uploadDto(upload, user, scenarios.map((s) => s.id)), scenarios: scenarios.map(summaryDto) })
  })
}
