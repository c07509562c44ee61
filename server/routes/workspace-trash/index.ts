import { access } from '../../auth/access'
import type { SecureRouter } from '../../http/secure-router'
import { undoDeleteWorkspace } from '../../services/scenarios'

/** DELETE /api/workspaces/:id is a soft delete; its owner may undo it for 30 days. */
export function workspaceTrashRoutes(r: SecureRouter): void {
  r.post('/workspaces/:id/undo-delete', { access: access.workspace(['owner'], { allowDeleted: true }) }, async (req, res) => {
    const workspace = await undoDeleteWorkspace(String(req.params.id))
    res.json({ workspace: { id: workspace.id, name: workspace.name, role: 'owner' } })
  })
}
