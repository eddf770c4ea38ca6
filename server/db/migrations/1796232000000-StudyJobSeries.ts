// A study job's result keeps the heatmap series once, as its block's mean, beside summaries that no
// longer carry them. Results stored before keep their series inside each summary and leave this empty.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class StudyJobSeries1796232000000 implements MigrationInterface {
  name = 'StudyJobSeries1796232000000';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "study_job_results" ADD "series" jsonb`);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "study_job_results" DROP COLUMN "series"`);
  }
}
