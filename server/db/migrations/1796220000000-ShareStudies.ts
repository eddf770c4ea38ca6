import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Share links may point at a study as well as a run. */
export class ShareStudies1796220000000 implements MigrationInterface {
  name = 'ShareStudies1796220000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "share_links" DROP CONSTRAINT "CHK_share_links_kind"`);
    await queryRunner.query(
      `ALTER TABLE "share_links" ADD CONSTRAINT "CHK_share_links_kind" CHECK (kind IN ('run', 'study'))`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DELETE FROM "share_links" WHERE kind = 'study'`);
    await queryRunner.query(`ALTER TABLE "share_links" DROP CONSTRAINT "CHK_share_links_kind"`);
    await queryRunner.query(`ALTER TABLE "share_links" ADD CONSTRAINT "CHK_share_links_kind" CHECK (kind IN ('run'))`);
  }
}
