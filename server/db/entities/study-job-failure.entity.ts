// A server job that failed on every attempt (a worker crash, the time limit, an error) and reached the
// dead-letter queue. Keyed like a job result, so a job is recorded as failed at most once; resuming the
// study clears its failures and queues those jobs again.
import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, Unique } from 'typeorm';
import { StudyEntity } from './study.entity';

@Entity({ name: 'study_job_failures' })
@Unique('UQ_study_job_failures_job', ['studyId', 'pointIndex', 'first'])
export class StudyJobFailureEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

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
  reason!: string;

  @CreateDateColumn({ type: 'timestamptz', name: 'failed_at' })
  failedAt!: Date;
}
