// A set of runs compared side by side, stored so a share link can point at it. One row per organisation
// and ordered set of runs: asking again for the same runs finds the same comparison.
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { OrganisationEntity } from './organisation.entity';

@Entity({ name: 'comparisons' })
@Index('UQ_comparisons_runs', ['organisationId', 'runKey'], { unique: true })
export class ComparisonEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'PK_comparisons' })
  id!: string;

  @Column({ type: 'uuid', name: 'organisation_id' })
  organisationId!: string;

  @ManyToOne(() => OrganisationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisation_id', foreignKeyConstraintName: 'FK_comparisons_organisation' })
  organisation?: OrganisationEntity;

  @Column({ type: 'uuid', name: 'run_ids', array: true })
  runIds!: string[];

  /** The run ids joined in order, for the uniqueness above. */
  @Column({ type: 'text', name: 'run_key' })
  runKey!: string;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;
}
