import type { ZodType } from 'zod'
import { errorBodySchema } from '@shared/schemas/errors'
import { ApiError, codeForStatus } from './errors'

/** How the HTTP layer reaches the session without owning it (the auth store does). */
export interface AuthHooks {
  /** The current access token, or null when signed out. */
  accessToken(): string | null
  /** Gets a fresh access token; resolves false when the session is over. */
  refresh(): Promise<boolean>
}

export interface HttpOptions {
  /** Prefix of every path; '' means the page's own origin. */
  baseUrl?: string
  auth?: AuthHooks
}

export type Method = 'GET' | 'POST' | 'PATCH' | 'DELETE'

interface BaseRequest {
  method?: Method
  body?: unknown
  /** Send the access token and, on a 401, refresh once and retry (default true). */
  auth?: boolean
  signal?: AbortSignal
}

export interface Http {
  /** A call whose answer is parsed with `schema`; a mismatch is an ApiError `bad_response`. */
  request<T>(path: string, options: BaseRequest & { schema: ZodType<T> }): Promise<T>
  /** A call whose answer has no body we use (204, 202). */
  request(path: string, options?: BaseRequest): Promise<void>
}

export function createHttp(options: HttpOptions = {}): Http {
  const baseUrl = options.baseUrl ?? ''
  const hooks = options.auth

  // A FormData body (a file upload) goes as it is: fetch sets the multipart boundary itself.
  async function send(path: string, req: BaseRequest, json: string | FormData | undefined): Promise<Response> {
    const headers: Record<string, string> = { Accept: 'application/json' }
    if (typeof json === 'string') headers['Content-Type'] = 'application/json'
    const token = req.auth !== false ? hooks?.accessToken() : null
    if (token) headers.Authorization = `Bearer ${token}`
    try {
      return await fetch(baseUrl + path, {
        method: req.method ?? 'GET',
        headers,
        body: json,
        credentials: 'same-origin',
        signal: req.signal,
      })
    } catch (err) {
      if (err instanceof DOMException && err.name === 'AbortError') throw err
      throw new ApiError(0, 'network', 'Could not reach the Chimeline server. Check your connection and that the server is running.')
    }
  }

  async function request<T>(path: string, req: BaseRequest & { schema?: ZodType<T> } = {}): Promise<T | void> {
    const json = req.body === undefined ? undefined : req.body instanceof FormData ? req.body : JSON.stringify(req.body)
    let res = await send(path, req, json)
    if (res.status === 401 && req.auth !== false && hooks) {
      if (await hooks.refresh()) res = await send(path, req, json)
    }
    const label = `${req.method ?? 'GET'} ${path}`
    if (!res.ok) throw await errorFrom(res, label)
    if (!req.schema) return
    return parseBody(res, req.schema, label)
  }

  return { request: request as Http['request'] }
}

async function readJson(res: Response): Promise<unknown> {
  try {
    return await res.json()
  } catch {
    return undefined
  }
}

async function errorFrom(res: Response, label: string): Promise<ApiError> {
  const body = await readJson(res)
  const parsed = errorBodySchema.safeParse(body)
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error
    return new ApiError(res.status, code, message, fields ?? {}, body)
  }
  const statusText = res.statusText ? ` ${res.statusText}` : ''
  return new ApiError(res.status, codeForStatus(res.status), `The server answered ${res.status}${statusText} to ${label}.`, {}, body)
}

async function parseBody<T>(res: Response, schema: ZodType<T>, label: string): Promise<T> {
  const parsed = schema.safeParse(await readJson(res))
  if (parsed.success) return parsed.data
  const first = parsed.error.issues[0]
  const where = first && first.path.length > 0 ? ` at ${first.path.join('.')}` : ''
  throw new ApiError(
    res.status,
    'bad_response',
    `The server's answer to ${label} did not have the expected shape${where}: ${first?.message ?? 'unreadable body'}.`,
  )
}
