// A signed-in browser session (lucia's session table); deleting the row signs that browser out.
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { UserEntity } from './user.entity';

@Entity({ name: 'sessions' })
@Index('IDX_sessions_user', ['userId'])
@Index('IDX_sessions_expires_at', ['expiresAt'])
export class SessionEntity {
  @PrimaryColumn({ type: 'text' })
  id!: string;

  @Column({ type: 'uuid', name: 'user_id' })
  userId!: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @Column({ type: 'timestamptz', name: 'expires_at' })
  expiresAt!: Date;
}
