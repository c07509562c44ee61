import type { Migration } from '../db/migrator'

/**
 * Versions are never overwritten: the database itself refuses an UPDATE, so
 * no code path can change history. (Deleting stays possible, for the purge of
 * a scenario deleted more than 30 days ago, through ON DELETE CASCADE.)
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE FUNCTION scenario_versions_immutable() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      RAISE EXCEPTION 'scenario versions are immutable (version % of scenario %)', OLD.number, OLD.scenario_id;
    END $$;
    CREATE TRIGGER scenario_versions_no_update BEFORE UPDATE ON scenario_versions
      FOR EACH ROW EXECUTE FUNCTION scenario_versions_immutable();
  `)
}

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query(`
    DROP TRIGGER scenario_versions_no_update ON scenario_versions;
    DROP FUNCTION scenario_versions_immutable();
  `)
}
