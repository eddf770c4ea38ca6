import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Stored comparisons of runs, and share links that point at one. */
export class ShareComparisons1796231000000 implements MigrationInterface {
  name = 'ShareComparisons1796231000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "comparisons" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "organisation_id" uuid NOT NULL, "run_ids" uuid array NOT NULL, "run_key" text NOT NULL, "created_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_comparisons" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_comparisons_runs" ON "comparisons" ("organisation_id", "run_key")`,
    );
    await queryRunner.query(
      `ALTER TABLE "comparisons" ADD CONSTRAINT "FK_comparisons_organisation" FOREIGN KEY ("organisation_id") REFERENCES "organisations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(`ALTER TABLE "share_links" DROP CONSTRAINT "CHK_share_links_kind"`);
    await queryRunner.query(
      `ALTER TABLE "share_links" ADD CONSTRAINT "CHK_share_links_kind" CHECK (kind IN ('run', 'study', 'comparison'))`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DELETE FROM "share_links" WHERE kind = 'comparison'`);
    await queryRunner.query(`ALTER TABLE "share_links" DROP CONSTRAINT "CHK_share_links_kind"`);
    await queryRunner.query(
      `ALTER TABLE "share_links" ADD CONSTRAINT "CHK_share_links_kind" CHECK (kind IN ('run', 'study'))`,
    );
    await queryRunner.query(`DROP TABLE "comparisons"`);
  }
}
