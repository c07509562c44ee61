import { createAdminApi } from './admin'
import { createAuthApi } from './auth'
import { createHttp, type HttpOptions } from './http'
import { createMembersApi } from './members'
import { createScenarioApi } from './scenarios'
import { createShareApi } from './shares'
import { createSuiteApi } from './suites'
import { createSweepApi } from './sweeps'
import { createUploadApi } from './uploads'
import { createWorkspaceApi } from './workspaces'

export { ApiError, type ApiErrorCode } from './errors'
export type { AuthHooks } from './http'

/** The typed API: one namespace per resource, every answer checked against shared/schemas. */
export function createApi(options: HttpOptions = {}) {
  const http = createHttp(options)
  return {
    auth: createAuthApi(http),
    workspaces: createWorkspaceApi(http),
    admin: createAdminApi(http),
    members: createMembersApi(http),
    scenarios: createScenarioApi(http),
    shares: createShareApi(http),
    uploads: createUploadApi(http),
    sweeps: createSweepApi(http),
    suites: createSuiteApi(http),
  }
}

export type Api = ReturnType<typeof createApi>
