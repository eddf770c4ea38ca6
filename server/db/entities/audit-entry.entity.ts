// Who created, changed, ran or deleted what. Rows outlive their actor (actor set to null when the user goes).
import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { AuditAction, AuditEntity as AuditEntityKind } from '../../../shared/api/audit';
import { OrganisationEntity } from './organisation.entity';
import { UserEntity } from './user.entity';

@Entity({ name: 'audit_entries' })
@Index('IDX_audit_entries_organisation_created', ['organisationId', 'createdAt'])
export class AuditEntryEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid', name: 'organisation_id', nullable: true })
  organisationId!: string | null;

  @ManyToOne(() => OrganisationEntity, { onDelete: 'CASCADE', nullable: true })
  @JoinColumn({ name: 'organisation_id' })
  organisation?: OrganisationEntity | null;

  @Column({ type: 'uuid', name: 'actor_id', nullable: true })
  actorId!: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'actor_id' })
  actor?: UserEntity | null;

  @Column({ type: 'text' })
  action!: AuditAction;

  @Column({ type: 'text' })
  entity!: AuditEntityKind;

  @Column({ type: 'text', name: 'entity_id' })
  entityId!: string;

  @Column({ type: 'jsonb', default: {} })
  detail!: Record<string, unknown>;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;
}
