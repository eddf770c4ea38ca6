// Stores one job's result, once: the unique key on (study, point, first replication) makes a retried,
// duplicated or late job a no-op. Used by the browser's POST of a result and by the server's workers.
import type { DataSource } from 'typeorm';
import type { SaveJobResultInput } from '../../shared/api/studies';
import { figuresOf } from '../../shared/studies/replication-summary-json';
import { StudyJobResultEntity } from '../db/entities';

/** True when this call stored the result, false when the job already had one. */
export async function saveJobResult(
  ds: DataSource,
  studyId: string,
  body: SaveJobResultInput,
  authorId: string | null,
): Promise<boolean> {
  const done = body.outcome === 'done';
  const inserted = await ds
    .getRepository(StudyJobResultEntity)
    .createQueryBuilder()
    .insert()
    .values({
      studyId,
      pointIndex: body.pointIndex,
      first: body.first,
      count: body.count,
      outcome: body.outcome,
      message: done ? null : body.message,
      engineVersion: done ? body.engineVersion : null,
      figures: done ? body.summaries.map(figuresOf) : [],
      summaries: done ? body.summaries : null,
      series: done ? (body.series ?? null) : null,
      events: done ? body.events : null,
      createdById: authorId,
    })
    .orIgnore()
    .execute();
  return (inserted.raw as unknown[]).length > 0;
}
