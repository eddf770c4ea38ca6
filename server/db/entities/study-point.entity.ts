// One configuration of a study: a revision and the fields changed from it. Points never change after
// the study is made; the job results refer to them by index.
import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, Unique } from 'typeorm';
import type { PointChange } from '../../../shared/studies/point-changes';
import { ScenarioRevisionEntity } from './scenario-revision.entity';
import { StudyEntity } from './study.entity';

@Entity({ name: 'study_points' })
@Unique('UQ_study_points_study_index', ['studyId', 'index'])
export class StudyPointEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid', name: 'study_id' })
  studyId!: string;

  @ManyToOne(() => StudyEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'study_id' })
  study?: StudyEntity;

  @Column({ type: 'integer' })
  index!: number;

  @Column({ type: 'uuid', name: 'revision_id' })
  revisionId!: string;

  @ManyToOne(() => ScenarioRevisionEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'revision_id' })
  revision?: ScenarioRevisionEntity;

  @Column({ type: 'text' })
  label!: string;

  @Column({ type: 'jsonb' })
  changes!: PointChange[];
}
