// The conveyor mode of each revision (independent carriers or the belt baseline) in a plain column, so
// scenario and run lists can mark belt scenarios without reading whole documents. Existing revisions
// are filled from their documents here; a trigger sets it from the document on every insert, so no
// code path can store a revision whose column disagrees with its document.
import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The mode a stored document declares; a document without a conveyor uses the schema's default, carriers. */
const modeOf = (document: string) =>
  `CASE WHEN ${document} -> 'conveyor' ->> 'kind' = 'belt' THEN 'belt' ELSE 'carriers' END`;

export class ConveyorMode1796230000000 implements MigrationInterface {
  name = 'ConveyorMode1796230000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "scenario_revisions" ADD "conveyor_mode" text NOT NULL DEFAULT 'carriers'`);
    // The immutability trigger lets this through: it guards the content columns, not this one.
    await queryRunner.query(`UPDATE "scenario_revisions" SET "conveyor_mode" = ${modeOf('"document"')}`);
    await queryRunner.query(`
      CREATE FUNCTION lanewright_revision_conveyor_mode() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        NEW.conveyor_mode := ${modeOf('NEW.document')};
        RETURN NEW;
      END;
      $$`);
    await queryRunner.query(`
      CREATE TRIGGER scenario_revisions_conveyor_mode BEFORE INSERT OR UPDATE ON scenario_revisions
      FOR EACH ROW EXECUTE FUNCTION lanewright_revision_conveyor_mode()`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query('DROP TRIGGER scenario_revisions_conveyor_mode ON scenario_revisions');
    await queryRunner.query('DROP FUNCTION lanewright_revision_conveyor_mode()');
    await queryRunner.query(`ALTER TABLE "scenario_revisions" DROP COLUMN "conveyor_mode"`);
  }
}
