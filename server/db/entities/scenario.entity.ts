// A layout being designed. Its content lives in immutable revisions; `latestRevisionId` points at the newest.
// Relations to revisions name the entity by string because scenario and revision refer to each other.
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { ProjectEntity } from './project.entity';
import { UserEntity } from './user.entity';

@Entity({ name: 'scenarios' })
@Index('IDX_scenarios_project_updated', ['projectId', 'updatedAt'])
export class ScenarioEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid', name: 'project_id' })
  projectId!: string;

  @ManyToOne(() => ProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'project_id' })
  project?: ProjectEntity;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text', default: '' })
  description!: string;

  /** Null only inside the transaction that creates the scenario and its first revision. */
  @Column({ type: 'uuid', name: 'latest_revision_id', nullable: true })
  latestRevisionId!: string | null;

  @ManyToOne('ScenarioRevisionEntity', { nullable: true, onDelete: 'NO ACTION' })
  @JoinColumn({ name: 'latest_revision_id' })
  latestRevision?: object | null;

  @Column({ type: 'uuid', name: 'created_by_id', nullable: true })
  createdById!: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'created_by_id' })
  createdBy?: UserEntity | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt!: Date;
}
