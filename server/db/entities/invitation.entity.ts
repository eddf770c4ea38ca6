// An invitation to join an organisation with a role. Only the SHA-256 of the link's token is stored; the
// person is added when they accept, never before. Accepted, revoked and expired rows stay for the record.
import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Role } from '../../../shared/api/roles';
import { OrganisationEntity } from './organisation.entity';
import { UserEntity } from './user.entity';

@Entity({ name: 'invitations' })
@Check('CHK_invitations_role', `role IN ('owner', 'engineer', 'viewer')`)
@Index('IDX_invitations_organisation_created', ['organisationId', 'createdAt'])
export class InvitationEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid', name: 'organisation_id' })
  organisationId!: string;

  @ManyToOne(() => OrganisationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisation_id' })
  organisation?: OrganisationEntity;

  @Column({ type: 'text' })
  email!: string;

  @Column({ type: 'text' })
  role!: Role;

  @Column({ type: 'text', name: 'token_hash', unique: true })
  tokenHash!: string;

  @Column({ type: 'uuid', name: 'invited_by_id', nullable: true })
  invitedById!: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'invited_by_id' })
  invitedBy?: UserEntity | null;

  @Column({ type: 'timestamptz', name: 'expires_at' })
  expiresAt!: Date;

  /** When the link was last mailed; a resend makes a new token and moves the expiry. */
  @Column({ type: 'timestamptz', name: 'sent_at' })
  sentAt!: Date;

  @Column({ type: 'timestamptz', name: 'accepted_at', nullable: true })
  acceptedAt!: Date | null;

  @Column({ type: 'timestamptz', name: 'revoked_at', nullable: true })
  revokedAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;
}
