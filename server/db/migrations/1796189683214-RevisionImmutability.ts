// Revisions are snapshots: once written, their content never changes. The trigger makes that hold even for
// code that bypasses the API. Only `created_by_id` may change, because deleting a user sets it to null.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class RevisionImmutability1796189683214 implements MigrationInterface {
  name = 'RevisionImmutability1796189683214';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
      CREATE FUNCTION lanewright_refuse_revision_change() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        IF NEW.id IS DISTINCT FROM OLD.id
          OR NEW.scenario_id IS DISTINCT FROM OLD.scenario_id
          OR NEW.number IS DISTINCT FROM OLD.number
          OR NEW.document IS DISTINCT FROM OLD.document
          OR NEW.message IS DISTINCT FROM OLD.message
          OR NEW.created_at IS DISTINCT FROM OLD.created_at THEN
          RAISE EXCEPTION 'scenario revisions are immutable; save a new revision instead' USING ERRCODE = 'check_violation';
        END IF;
        RETURN NEW;
      END;
      $$`);
    await queryRunner.query(`
      CREATE TRIGGER scenario_revisions_immutable BEFORE UPDATE ON scenario_revisions
      FOR EACH ROW EXECUTE FUNCTION lanewright_refuse_revision_change()`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TRIGGER scenario_revisions_immutable ON scenario_revisions');
    await queryRunner.query('DROP FUNCTION lanewright_refuse_revision_change()');
  }
}
