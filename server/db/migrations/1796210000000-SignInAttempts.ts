// Sign-in attempt counters in PostgreSQL, so every server process sees the same counts.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class SignInAttempts1796210000000 implements MigrationInterface {
  name = 'SignInAttempts1796210000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "sign_in_attempts" ("key" character varying(255) NOT NULL, "points" integer NOT NULL DEFAULT '0', "expire" bigint, CONSTRAINT "PK_sign_in_attempts" PRIMARY KEY ("key"))`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "sign_in_attempts"`);
  }
}
