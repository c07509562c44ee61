import { computed, ref, shallowRef } from 'vue'
import { defineStore } from 'pinia'
import type { BulkInvitationBody, BulkInvitationResult } from '@shared/schemas/classroom'
import type { InvitationBody, MembersResponse, WorkspaceRole } from '@shared/schemas/workspace'
import { ApiError } from '@/api'
import { leaveBlocker, memberActions, type Viewer } from '@/lib/workspace/memberRules'
import { useAuthStore } from './auth'
import { useWorkspaceStore } from './workspace'

function asApiError(err: unknown): ApiError {
  return err instanceof ApiError ? err : new ApiError(0, 'internal', 'Something went wrong in the page. Reload it and try again.')
}

/** Members and pending invitations of the current workspace, and the owner's actions on them. */
export const useMembersStore = defineStore('members', () => {
  const auth = useAuthStore()
  const workspace = useWorkspaceStore()
  const data = shallowRef<MembersResponse>({ members: [], invitations: [] })
  const loadedFor = ref<string | null>(null)
  const loading = ref(false)
  const error = ref<ApiError | null>(null)

  const viewer = computed<Viewer | null>(() => {
    const me = auth.user
    const ws = workspace.current
    if (!me || !ws) return null
    return { myId: me.id, myRole: ws.role, ownerCount: data.value.members.filter((m) => m.role === 'owner').length }
  })

  const rows = computed(() =>
    data.value.members.map((m) => ({ ...m, actions: viewer.value ? memberActions(viewer.value, m) : null })),
  )
  const cannotLeave = computed(() => (viewer.value ? leaveBlocker(viewer.value) : null))

  function requireWorkspace(): string {
    const id = workspace.current?.id
    if (!id) throw new ApiError(0, 'not_found', 'Choose a workspace first.')
    return id
  }

  async function load() {
    const id = workspace.current?.id
    if (!id) return
    loading.value = true
    error.value = null
    try {
      data.value = await auth.api.members.list(id)
      loadedFor.value = id
    } catch (err) {
      error.value = asApiError(err)
    } finally {
      loading.value = false
    }
  }

  async function invite(body: InvitationBody) {
    await auth.api.members.invite(requireWorkspace(), body)
    await load()
  }

  async function inviteClass(body: BulkInvitationBody): Promise<BulkInvitationResult> {
    const result = await auth.api.members.inviteClass(requireWorkspace(), body)
    await load()
    return result
  }

  async function changeRole(userId: string, role: WorkspaceRole) {
    await auth.api.members.changeRole(requireWorkspace(), userId, role)
    await load()
  }

  async function remove(userId: string) {
    await auth.api.members.remove(requireWorkspace(), userId)
    await load()
  }

  /**
   * Hands ownership to another member: they become owner first, then the
   * viewer steps down to editor, so the workspace is never without an owner
   * even if the second call fails (it then has two owners, which the page shows).
   */
  async function transferOwnership(userId: string) {
    const id = requireWorkspace()
    const me = auth.user
    if (!me) throw new ApiError(401, 'unauthenticated', 'Sign in again to continue.')
    await auth.api.members.changeRole(id, userId, 'owner')
    try {
      await auth.api.members.changeRole(id, me.id, 'editor')
    } finally {
      await Promise.all([load(), workspace.load()])
    }
  }

  /** Leaves the current workspace; the switcher then picks another one. */
  async function leave() {
    const id = requireWorkspace()
    const me = auth.user
    if (!me) throw new ApiError(401, 'unauthenticated', 'Sign in again to continue.')
    await auth.api.members.remove(id, me.id)
    data.value = { members: [], invitations: [] }
    loadedFor.value = null
    await workspace.load()
  }

  return { data, loadedFor, loading, error, viewer, rows, cannotLeave, load, invite, inviteClass, changeRole, remove, transferOwnership, leave }
})
