import pg from 'pg'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { databaseUrl, startCluster, testCluster } from '../../server/db/cluster'
import { openConnection } from '../../server/db/connection'
import { createMigrator } from '../../server/db/migrator'

/** A scratch database of its own, so reverting does not disturb the other tests. */
const SCRATCH = 'chimeline_migrations_check'

async function admin(sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: databaseUrl(testCluster, 'postgres') })
  await client.connect()
  try {
    await client.query(sql)
  } finally {
    await client.end()
  }
}

beforeAll(async () => {
  await startCluster(testCluster)
  await admin(`DROP DATABASE IF EXISTS ${SCRATCH} WITH (FORCE)`)
  await admin(`CREATE DATABASE ${SCRATCH}`)
})
afterAll(async () => {
  await admin(`DROP DATABASE IF EXISTS ${SCRATCH} WITH (FORCE)`)
})

describe('migrations', () => {
  it('apply up, revert down one by one to an empty schema, and apply up again', async () => {
    const sequelize = openConnection(databaseUrl(testCluster, SCRATCH))
    try {
      const migrator = createMigrator(sequelize)
      const applied = await migrator.up()
      expect(applied.length).toBeGreaterThanOrEqual(7)
      expect(applied.map((m) => m.name)).toEqual([...applied.map((m) => m.name)].sort())
      const tables = async () =>
        (await sequelize.getQueryInterface().showAllTables()).filter((t) => t !== 'schema_migrations').sort()
      expect(await tables()).toEqual(['invitations', 'mail_sends', 'memberships', 'outbox_messages', 'password_resets', 'refresh_tokens', 'scenario_versions', 'scenarios', 'sessions', 'share_links', 'suite_runs', 'suites', 'sweep_points', 'sweeps', 'uploads', 'users', 'workspaces'])
      for (let i = applied.length; i > 0; i--) await migrator.down()
      expect(await tables()).toEqual([])
      expect(await migrator.pending()).toHaveLength(applied.length)
      await migrator.up()
      expect(await migrator.pending()).toHaveLength(0)
    } finally {
      await sequelize.close()
    }
  })
})
