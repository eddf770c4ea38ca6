// A line-design job inside an organisation; deleting it removes its scenarios, revisions and runs.
import { Column, Entity, Index, JoinColumn, ManyToOne, Unique } from 'typeorm';
import { EditableRecord } from './authored';
import { OrganisationEntity } from './organisation.entity';

@Entity({ name: 'projects' })
@Unique('UQ_projects_organisation_client', ['organisationId', 'clientId'])
@Index('IDX_projects_organisation_updated', ['organisationId', 'updatedAt'])
export class ProjectEntity extends EditableRecord {
  @Column({ type: 'uuid', name: 'organisation_id' })
  organisationId!: string;

  @ManyToOne(() => OrganisationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisation_id' })
  organisation?: OrganisationEntity;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text', default: '' })
  description!: string;

  /** Chosen by the client before the first attempt, so a retried create returns this project. */
  @Column({ type: 'uuid', name: 'client_id', nullable: true })
  clientId!: string | null;
}
