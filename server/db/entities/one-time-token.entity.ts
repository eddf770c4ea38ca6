// A single-use e-mailed link that is not an invitation: a password reset, or the link that finishes a
// sign-up. Only the token's SHA-256 is stored; `usedAt` marks it spent.
import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { UserEntity } from './user.entity';

export type TokenPurpose = 'password-reset' | 'sign-up';

@Entity({ name: 'one_time_tokens' })
@Check('CHK_one_time_tokens_purpose', `purpose IN ('password-reset', 'sign-up')`)
@Index('IDX_one_time_tokens_email_created', ['email', 'createdAt'])
export class OneTimeTokenEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'text' })
  purpose!: TokenPurpose;

  @Column({ type: 'text', name: 'token_hash', unique: true })
  tokenHash!: string;

  @Column({ type: 'text' })
  email!: string;

  @Column({ type: 'uuid', name: 'user_id', nullable: true })
  userId!: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE', nullable: true })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity | null;

  /** What the link completes, e.g. a sign-up's name, organisation and password hash. */
  @Column({ type: 'jsonb', default: {} })
  payload!: Record<string, string>;

  @Column({ type: 'timestamptz', name: 'expires_at' })
  expiresAt!: Date;

  @Column({ type: 'timestamptz', name: 'used_at', nullable: true })
  usedAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;
}
