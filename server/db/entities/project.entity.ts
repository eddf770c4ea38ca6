// A line-design job inside an organisation; deleting it removes its scenarios, revisions and runs.
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { EditableRecord } from './authored';
import { OrganisationEntity } from './organisation.entity';

@Entity({ name: 'projects' })
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
}
