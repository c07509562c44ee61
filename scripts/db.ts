/**
 * The project's private PostgreSQL (see server/db/cluster.ts).
 *
 *   npx tsx scripts/db.ts start          start the data cluster, create the database, migrate (idempotent)
 *   npx tsx scripts/db.ts stop           stop the data cluster (npm run db:stop)
 *   npx tsx scripts/db.ts migrate        apply pending migrations to DATABASE_URL or the data cluster
 *   npx tsx scripts/db.ts migrate:down   revert the last migration
 *   npx tsx scripts/db.ts test-setup     start the test cluster, recreate chimeline_test, migrate
 *   npx tsx scripts/db.ts test-teardown  stop the test cluster
 */
import { openConnection } from '../server/db/connection'
import { createMigrator } from '../server/db/migrator'
import {
  databaseUrl,
  ensureDatabase,
  mainCluster,
  recreateDatabase,
  startCluster,
  stopCluster,
  testCluster,
  type ClusterSpec,
} from '../server/db/cluster'

/** Applies pending migrations (or reverts the last one); returns their names. */
export async function migrateDatabase(url: string, direction: 'up' | 'down' = 'up'): Promise<string[]> {
  const sequelize = openConnection(url)
  try {
    const migrator = createMigrator(sequelize)
    const done = direction === 'up' ? await migrator.up() : await migrator.down()
    return done.map((m) => m.name)
  } finally {
    await sequelize.close()
  }
}

/** Starts a cluster and brings its database to the newest schema. */
export async function prepareCluster(spec: ClusterSpec, options: { recreate?: boolean } = {}): Promise<string> {
  await startCluster(spec)
  if (options.recreate) await recreateDatabase(spec)
  else await ensureDatabase(spec)
  const url = databaseUrl(spec)
  await migrateDatabase(url)
  return url
}

async function main(command: string | undefined): Promise<void> {
  const started = performance.now()
  const took = () => `${((performance.now() - started) / 1000).toFixed(1)} s`
  switch (command) {
    case 'start': {
      const url = await prepareCluster(mainCluster)
      console.log(`PostgreSQL is up: ${url} (${took()})`)
      break
    }
    case 'stop':
      console.log(stopCluster(mainCluster) ? 'PostgreSQL stopped.' : 'PostgreSQL was not running.')
      break
    case 'migrate': {
      const url = process.env.DATABASE_URL ?? (await prepareCluster(mainCluster))
      const names = await migrateDatabase(url)
      console.log(names.length ? `Applied: ${names.join(', ')}` : 'No pending migrations.')
      break
    }
    case 'migrate:down': {
      const url = process.env.DATABASE_URL ?? databaseUrl(mainCluster)
      const names = await migrateDatabase(url, 'down')
      console.log(names.length ? `Reverted: ${names.join(', ')}` : 'Nothing to revert.')
      break
    }
    case 'test-setup': {
      const url = await prepareCluster(testCluster, { recreate: true })
      console.log(`Test database ready: ${url} (${took()})`)
      break
    }
    case 'test-teardown':
      stopCluster(testCluster)
      break
    default:
      console.error('usage: tsx scripts/db.ts start|stop|migrate|migrate:down|test-setup|test-teardown')
      process.exit(2)
  }
}

// Only as a command: start.ts, dev.ts and the test server import prepareCluster.
if (import.meta.url === `file://${process.argv[1]}`) {
  main(process.argv[2]).catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : err)
    process.exit(1)
  })
}
