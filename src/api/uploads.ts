import { uploadInspectionSchema, uploadResponseSchema, type UploadKind } from '@shared/schemas/upload'
import type { Http } from './http'

export interface UploadChoice {
  kind?: UploadKind
  /** ELF: the function to import. */
  function?: string
  title?: string
  /** The preset the imported program runs on; the workspace's default when absent. */
  preset?: string
}

function form(file: File, choice: UploadChoice): FormData {
  const data = new FormData()
  // Text fields first: the server reads them before the file arrives.
  if (choice.kind) data.set('kind', choice.kind)
  if (choice.function) data.set('function', choice.function)
  if (choice.title) data.set('title', choice.title)
  if (choice.preset) data.set('preset', choice.preset)
  data.set('file', file, file.name)
  return data
}

/** /api/workspaces/:id/uploads: import a file as scenarios; errors carry uploadErrorBodySchema in ApiError.body. */
export function createUploadApi(http: Http) {
  const base = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/uploads`
  return {
    /** What the file is and what is in it (an ELF's functions, a bundle's titles); nothing is stored. */
    inspect: (workspaceId: string, file: File, choice: UploadChoice = {}) =>
      http.request(`${base(workspaceId)}/inspect`, { method: 'POST', body: form(file, choice), schema: uploadInspectionSchema }),
    importFile: (workspaceId: string, file: File, choice: UploadChoice = {}) =>
      http.request(base(workspaceId), { method: 'POST', body: form(file, choice), schema: uploadResponseSchema }),
  }
}
