// A study: the points of one question about a project's scenario and the settings every point runs
// under. Progress (jobs done) is counted from the stored job results, never kept as a counter, so a
// retried save cannot inflate it.
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { EditableRecord } from './authored';
import type { StudyKind, StudyRunPlace, StudyStatus } from '../../../shared/api/studies';
import type { RunSettings } from '../../../shared/scenario/run-settings';
import { ProjectEntity } from './project.entity';
import { ScenarioRevisionEntity } from './scenario-revision.entity';

@Entity({ name: 'studies' })
@Index('IDX_studies_project_created', ['projectId', 'createdAt'])
@Index('IDX_studies_revision', ['revisionId'])
@Index('IDX_studies_created_by', ['createdById'])
export class StudyEntity extends EditableRecord {
  @Column({ type: 'uuid', name: 'project_id' })
  projectId!: string;

  @ManyToOne(() => ProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'project_id' })
  project?: ProjectEntity;

  /** The revision points run unless a point names another. */
  @Column({ type: 'uuid', name: 'revision_id' })
  revisionId!: string;

  @ManyToOne(() => ScenarioRevisionEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'revision_id' })
  revision?: ScenarioRevisionEntity;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text' })
  kind!: StudyKind;

  @Column({ type: 'jsonb' })
  settings!: RunSettings;

  @Column({ type: 'boolean', name: 'common_random_numbers' })
  commonRandomNumbers!: boolean;

  @Column({ type: 'integer', name: 'block_size' })
  blockSize!: number;

  @Column({ type: 'double precision', nullable: true })
  reduction!: number | null;

  @Column({ type: 'jsonb' })
  axes!: { path: string; label: string }[];

  @Column({ type: 'text' })
  status!: StudyStatus;

  @Column({ type: 'integer', name: 'point_count' })
  pointCount!: number;

  @Column({ type: 'integer', name: 'job_count' })
  jobCount!: number;

  @Column({ type: 'text', name: 'run_on', default: 'browser' })
  runOn!: StudyRunPlace;

  /**
   * Server studies: which enqueueing of the jobs is current. Resuming enqueues the pending jobs again under
   * new queue ids, so jobs of an earlier round that are still about are recognised and dropped.
   */
  @Column({ type: 'integer', name: 'queue_round', default: 0 })
  queueRound!: number;

  /** Server studies: when the current round was queued, for the time taken and the finish mail. */
  @Column({ type: 'timestamptz', name: 'queued_at', nullable: true })
  queuedAt!: Date | null;

  @Column({ type: 'timestamptz', name: 'finished_at', nullable: true })
  finishedAt!: Date | null;
}
