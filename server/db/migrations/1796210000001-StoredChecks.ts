// Idempotency keys for creating projects and scenarios, whether the server checked a stored run, and the
// time-study analysis computed once at upload.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class StoredChecks1796210000001 implements MigrationInterface {
  name = 'StoredChecks1796210000001';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "projects" ADD "client_id" uuid`);
    await queryRunner.query(
      `ALTER TABLE "projects" ADD CONSTRAINT "UQ_projects_organisation_client" UNIQUE ("organisation_id", "client_id")`,
    );
    await queryRunner.query(`ALTER TABLE "scenarios" ADD "client_id" uuid`);
    await queryRunner.query(
      `ALTER TABLE "scenarios" ADD CONSTRAINT "UQ_scenarios_project_client" UNIQUE ("project_id", "client_id")`,
    );
    await queryRunner.query(`ALTER TABLE "runs" ADD "server_checked" boolean NOT NULL DEFAULT false`);
    await queryRunner.query(`ALTER TABLE "time_studies" ADD "analysis" jsonb`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "time_studies" DROP COLUMN "analysis"`);
    await queryRunner.query(`ALTER TABLE "runs" DROP COLUMN "server_checked"`);
    await queryRunner.query(`ALTER TABLE "scenarios" DROP CONSTRAINT "UQ_scenarios_project_client"`);
    await queryRunner.query(`ALTER TABLE "scenarios" DROP COLUMN "client_id"`);
    await queryRunner.query(`ALTER TABLE "projects" DROP CONSTRAINT "UQ_projects_organisation_client"`);
    await queryRunner.query(`ALTER TABLE "projects" DROP COLUMN "client_id"`);
  }
}
