import type { Sequelize } from 'sequelize'
import type { SiteRole } from '../../shared/schemas/user'
import type { WorkspaceRole } from '../../shared/schemas/workspace'
import { hashPassword } from '../auth/passwords'
import type { AppContext } from '../context'
import { Membership, User, Workspace } from '../models'
import { seedKernelSuite } from './demo-kernels'
import { seedDemoScenarios, type DemoScenariosResult } from './demo-scenarios'

/** Our own demo: one workspace, one user per workspace role, and a site admin. */
export const DEMO_PASSWORD = 'chimeline-demo-2026'
export const DEMO_WORKSPACE = 'Vector Lab'
export const DEMO_USERS: readonly { email: string; name: string; site: SiteRole; workspace: WorkspaceRole | null }[] = [
  { email: 'owner@vector-lab.test', name: 'Olive Owner', site: 'member', workspace: 'owner' },
  { email: 'editor@vector-lab.test', name: 'Eddie Editor', site: 'member', workspace: 'editor' },
  { email: 'viewer@vector-lab.test', name: 'Vera Viewer', site: 'member', workspace: 'viewer' },
  { email: 'admin@vector-lab.test', name: 'Ada Admin', site: 'admin', workspace: null },
]

/**
 * Creates what is missing of the demo and changes nothing that exists (a demo
 * user who changed their password keeps it). Safe to run on every start.
 */
export async function seedDemo(sequelize: Sequelize): Promise<{ workspace: Workspace; owner: User }> {
  return sequelize.transaction(async (transaction) => {
    // Serialises concurrent seeds (npm start and the test server at once).
    await sequelize.query("SELECT pg_advisory_xact_lock(hashtext('chimeline-demo-seed'))", { transaction })
    const users = new Map<string, User>()
    for (const demo of DEMO_USERS) {
      let user = await User.findOne({ where: { email: demo.email }, transaction })
      user ??= await User.create(
        { email: demo.email, name: demo.name, role: demo.site, passwordHash: await hashPassword(DEMO_PASSWORD) },
        { transaction },
      )
      users.set(demo.email, user)
    }
    const owner = users.get('owner@vector-lab.test') as User
    let workspace = (
      await Membership.findOne({
        where: { userId: owner.id, role: 'owner' },
        include: [{ model: Workspace, as: 'workspace', required: true, where: { name: DEMO_WORKSPACE } }],
        transaction,
      })
    )?.workspace
    workspace ??= await Workspace.create({ name: DEMO_WORKSPACE }, { transaction })
    for (const demo of DEMO_USERS) {
      if (!demo.workspace) continue
      const user = users.get(demo.email) as User
      await Membership.findOrCreate({
        where: { workspaceId: workspace.id, userId: user.id },
        defaults: { workspaceId: workspace.id, userId: user.id, role: demo.workspace },
        transaction,
      })
    }
    return { workspace, owner }
  })
}

/**
 * The whole demo: users, workspace, the example scenarios with their share
 * link, and the kernel suite (demo-kernels.ts). Returns that link's URL for `npm start` to print.
 */
export async function seedDemoWithScenarios(ctx: AppContext): Promise<DemoScenariosResult> {
  const { workspace, owner } = await seedDemo(ctx.sequelize)
  const result = await seedDemoScenarios(ctx, workspace, owner)
  await seedKernelSuite(ctx, workspace, owner)
  return result
}
