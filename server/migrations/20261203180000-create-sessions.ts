import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

/**
 * One row per sign-in: its id is the `sid` claim of every access token of the
 * session and the family id of its refresh tokens. Sign-out and a password
 * reset set `ended_at`, which ends the access tokens too. Families that are
 * still live become sessions, so nobody is signed out by the upgrade.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('sessions', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    ended_at: { type: DataTypes.DATE, allowNull: true },
  })
  await qi.addIndex('sessions', ['user_id'])
  await qi.sequelize.query(`
    INSERT INTO sessions (id, user_id, created_at)
    SELECT family_id, MIN(user_id::text)::uuid, MIN(created_at) FROM refresh_tokens
    WHERE revoked_at IS NULL AND expires_at > now()
    GROUP BY family_id`)
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('sessions')
}
