// The result of one job (a block of replications of one point). The unique key on study, point and
// first replication makes saving idempotent: a retried or duplicated job is stored once. The engine's
// summaries are bulky and only read to merge blocks, so ordinary queries leave them out.
import { Column, Entity, JoinColumn, ManyToOne, Unique } from 'typeorm';
import type { JobResult } from '../../../shared/api/studies';
import type {
  ReplicationFigures,
  ReplicationSummaryJson,
  BlockSeriesJson,
} from '../../../shared/studies/replication-summary-json';
import { AuthoredRecord } from './authored';
import { StudyEntity } from './study.entity';

@Entity({ name: 'study_job_results' })
@Unique('UQ_study_job_results_job', ['studyId', 'pointIndex', 'first'])
export class StudyJobResultEntity extends AuthoredRecord {
  @Column({ type: 'uuid', name: 'study_id' })
  studyId!: string;

  @ManyToOne(() => StudyEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'study_id' })
  study?: StudyEntity;

  @Column({ type: 'integer', name: 'point_index' })
  pointIndex!: number;

  @Column({ type: 'integer', name: 'first_replication' })
  first!: number;

  @Column({ type: 'integer', name: 'replication_count' })
  count!: number;

  @Column({ type: 'text' })
  outcome!: JobResult['outcome'];

  @Column({ type: 'text', nullable: true })
  message!: string | null;

  @Column({ type: 'text', name: 'engine_version', nullable: true })
  engineVersion!: string | null;

  @Column({ type: 'jsonb' })
  figures!: ReplicationFigures[];

  @Column({ type: 'jsonb', select: false, nullable: true })
  summaries!: ReplicationSummaryJson[] | null;

  @Column({ type: 'jsonb', select: false, nullable: true })
  events!: number[] | null;

  /** The block's mean heatmap series; null for failed jobs and for results stored inside their summaries. */
  @Column({ type: 'jsonb', select: false, nullable: true })
  series!: BlockSeriesJson | null;
}
