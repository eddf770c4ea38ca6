// A read-only link to one thing (a run, a study or a comparison of runs) for someone without an account. Only the token's SHA-256
// is stored, so the table alone opens nothing.
import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { ShareKind } from '../../../shared/api/shares';
import { OrganisationEntity } from './organisation.entity';
import { UserEntity } from './user.entity';

@Entity({ name: 'share_links' })
@Check('CHK_share_links_kind', `kind IN ('run', 'study', 'comparison')`)
@Index('IDX_share_links_subject', ['kind', 'subjectId'])
@Index('IDX_share_links_organisation', ['organisationId'])
export class ShareLinkEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid', name: 'organisation_id' })
  organisationId!: string;

  @ManyToOne(() => OrganisationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisation_id' })
  organisation?: OrganisationEntity;

  @Column({ type: 'text' })
  kind!: ShareKind;

  @Column({ type: 'uuid', name: 'subject_id' })
  subjectId!: string;

  @Column({ type: 'text', name: 'token_hash', unique: true })
  tokenHash!: string;

  @Column({ type: 'uuid', name: 'created_by_id', nullable: true })
  createdById!: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'created_by_id' })
  createdBy?: UserEntity | null;

  @Column({ type: 'timestamptz', name: 'expires_at' })
  expiresAt!: Date;

  @Column({ type: 'timestamptz', name: 'revoked_at', nullable: true })
  revokedAt!: Date | null;

  @Column({ type: 'timestamptz', name: 'last_opened_at', nullable: true })
  lastOpenedAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;
}
