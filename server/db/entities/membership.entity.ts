// A user's role in one organisation; the pair is the primary key, so a user holds one role per organisation.
import {
  Check,
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { Role } from '../../../shared/api/roles';
import { OrganisationEntity } from './organisation.entity';
import { UserEntity } from './user.entity';

@Entity({ name: 'memberships' })
@Check('CHK_memberships_role', `role IN ('owner', 'engineer', 'viewer')`)
@Index('IDX_memberships_user', ['userId'])
export class MembershipEntity {
  @PrimaryColumn({ type: 'uuid', name: 'organisation_id' })
  organisationId!: string;

  @PrimaryColumn({ type: 'uuid', name: 'user_id' })
  userId!: string;

  @Column({ type: 'text' })
  role!: Role;

  @ManyToOne(() => OrganisationEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisation_id' })
  organisation?: OrganisationEntity;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt!: Date;
}
