// Price lists: one per organisation, money in exact numeric(14,2) (generated from PriceListEntity).
// Deleting the organisation deletes its list; deleting the last editor keeps it.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class PriceLists1796205600000 implements MigrationInterface {
  name = 'PriceLists1796205600000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "price_lists" ("organisation_id" uuid NOT NULL, "currency" character(3) NOT NULL, "track_per_metre" numeric(14,2) NOT NULL, "carrier" numeric(14,2) NOT NULL, "elevator" numeric(14,2) NOT NULL, "lateral_transfer" numeric(14,2) NOT NULL, "curve" numeric(14,2) NOT NULL, "automatic_station" numeric(14,2) NOT NULL, "manual_station" numeric(14,2) NOT NULL, "note" text NOT NULL DEFAULT '', "invented" boolean NOT NULL DEFAULT false, "updated_by_id" uuid, "updated_at" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_571dea27281b627590e5b7c05b7" PRIMARY KEY ("organisation_id"))`,
    );
    await queryRunner.query(
      `ALTER TABLE "price_lists" ADD CONSTRAINT "FK_571dea27281b627590e5b7c05b7" FOREIGN KEY ("organisation_id") REFERENCES "organisations"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "price_lists" ADD CONSTRAINT "FK_981c9ad59a6afa749f742b805e0" FOREIGN KEY ("updated_by_id") REFERENCES "users"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "price_lists" DROP CONSTRAINT "FK_981c9ad59a6afa749f742b805e0"`);
    await queryRunner.query(`ALTER TABLE "price_lists" DROP CONSTRAINT "FK_571dea27281b627590e5b7c05b7"`);
    await queryRunner.query(`DROP TABLE "price_lists"`);
  }
}
