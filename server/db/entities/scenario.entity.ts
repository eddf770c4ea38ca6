// A layout being designed. Its content lives in immutable revisions; `latestRevisionId` points at the newest.
// Relations to revisions name the entity by string because scenario and revision refer to each other.
import { Column, Entity, Index, JoinColumn, ManyToOne, Unique } from 'typeorm';
import { EditableRecord } from './authored';
import { ProjectEntity } from './project.entity';

@Entity({ name: 'scenarios' })
@Unique('UQ_scenarios_project_client', ['projectId', 'clientId'])
@Index('IDX_scenarios_project_updated', ['projectId', 'updatedAt'])
export class ScenarioEntity extends EditableRecord {
  @Column({ type: 'uuid', name: 'project_id' })
  projectId!: string;

  @ManyToOne(() => ProjectEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'project_id' })
  project?: ProjectEntity;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text', default: '' })
  description!: string;

  /** Chosen by the client before the first attempt, so a retried create returns this scenario. */
  @Column({ type: 'uuid', name: 'client_id', nullable: true })
  clientId!: string | null;

  /** Null only inside the transaction that creates the scenario and its first revision. */
  @Column({ type: 'uuid', name: 'latest_revision_id', nullable: true })
  latestRevisionId!: string | null;

  @ManyToOne('ScenarioRevisionEntity', { nullable: true, onDelete: 'NO ACTION' })
  @JoinColumn({ name: 'latest_revision_id' })
  latestRevision?: object | null;
}
