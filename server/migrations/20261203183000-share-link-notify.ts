import type { Migration } from '../db/migrator'

/**
 * Every app process keeps opened share links' state in memory
 * (services/share-links-open.ts) and drops it when PostgreSQL tells it that
 * something an open depends on changed: a link's own fields (revoke, expiry),
 * its scenario or workspace being deleted or restored, or rows going away.
 * Triggers, not application code, send the notice, so a change made by any
 * process, script or psql session reaches every cache. The payload says what
 * changed: "link:<token hash>", "scenario:<id>" or "workspace:<id>".
 * open_count and last_opened_at are left out on purpose: the count flush must
 * not empty the caches every few seconds.
 */
const SHARE_LINK_CHANNEL = 'chimeline_share_links'

export const up: Migration = async ({ context: qi }) => {
  const sql = (text: string) => qi.sequelize.query(text)
  await sql(`
    CREATE FUNCTION share_links_notify() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF TG_TABLE_NAME = 'share_links' THEN
        PERFORM pg_notify('${SHARE_LINK_CHANNEL}', 'link:' || OLD.token_hash);
      ELSIF TG_TABLE_NAME = 'scenarios' THEN
        PERFORM pg_notify('${SHARE_LINK_CHANNEL}', 'scenario:' || OLD.id);
      ELSE
        PERFORM pg_notify('${SHARE_LINK_CHANNEL}', 'workspace:' || OLD.id);
      END IF;
      RETURN NULL;
    END $$`)
  await sql(`
    CREATE TRIGGER share_links_notify AFTER UPDATE ON share_links FOR EACH ROW
    WHEN (OLD.revoked_at IS DISTINCT FROM NEW.revoked_at OR OLD.expires_at IS DISTINCT FROM NEW.expires_at
       OR OLD.access_mode IS DISTINCT FROM NEW.access_mode OR OLD.view IS DISTINCT FROM NEW.view
       OR OLD.version_id IS DISTINCT FROM NEW.version_id OR OLD.scenario_id IS DISTINCT FROM NEW.scenario_id
       OR OLD.token_hash IS DISTINCT FROM NEW.token_hash)
    EXECUTE FUNCTION share_links_notify()`)
  await sql('CREATE TRIGGER share_links_notify_delete AFTER DELETE ON share_links FOR EACH ROW EXECUTE FUNCTION share_links_notify()')
  for (const table of ['scenarios', 'workspaces']) {
    await sql(`
      CREATE TRIGGER share_links_notify AFTER UPDATE ON ${table} FOR EACH ROW
      WHEN (OLD.deleted_at IS DISTINCT FROM NEW.deleted_at${table === 'workspaces' ? ' OR OLD.name IS DISTINCT FROM NEW.name' : ''})
      EXECUTE FUNCTION share_links_notify()`)
    await sql(`CREATE TRIGGER share_links_notify_delete AFTER DELETE ON ${table} FOR EACH ROW EXECUTE FUNCTION share_links_notify()`)
  }
}

export const down: Migration = async ({ context: qi }) => {
  for (const table of ['share_links', 'scenarios', 'workspaces']) {
    await qi.sequelize.query(`DROP TRIGGER share_links_notify ON ${table}`)
    await qi.sequelize.query(`DROP TRIGGER share_links_notify_delete ON ${table}`)
  }
  await qi.sequelize.query('DROP FUNCTION share_links_notify()')
}
