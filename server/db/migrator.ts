import path from 'node:path'
import { fileURLToPath, pathToFileURL } from 'node:url'
import type { QueryInterface, Sequelize } from 'sequelize'
import { SequelizeStorage, Umzug, type MigrationFn } from 'umzug'

/** The signature of `up` and `down` in server/migrations/*.ts. */
export type Migration = MigrationFn<QueryInterface>

const migrationsDir = path.join(path.dirname(fileURLToPath(import.meta.url)), '..', 'migrations')

interface MigrationModule {
  up: Migration
  down: Migration
}

/**
 * umzug over server/migrations (timestamped TypeScript files, applied in name
 * order). Files are loaded with import(), so they run the same under tsx and
 * Vitest.
 */
export function createMigrator(sequelize: Sequelize): Umzug<QueryInterface> {
  return new Umzug({
    migrations: {
      glob: ['*.ts', { cwd: migrationsDir, ignore: ['*.test.ts', '*.d.ts'] }],
      resolve: ({ name, path: file, context }) => {
        const load = async () => (await import(pathToFileURL(file as string).href)) as MigrationModule
        return {
          name: name.replace(/\.ts$/, ''),
          up: async () => (await load()).up({ name, path: file, context }),
          down: async () => (await load()).down({ name, path: file, context }),
        }
      },
    },
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  })
}
