// Sign-in attempt counters, one row per limited key (an account or a source address), shared by every
// server process. The columns are the ones rate-limiter-flexible's PostgreSQL store reads and writes.
import { Column, Entity, PrimaryColumn } from 'typeorm';

@Entity({ name: 'sign_in_attempts' })
export class SignInAttemptEntity {
  @PrimaryColumn({ type: 'varchar', length: 255 })
  key!: string;

  @Column({ type: 'integer', default: 0 })
  points!: number;

  /** Milliseconds since the epoch when the window ends. */
  @Column({ type: 'bigint', nullable: true })
  expire!: string | null;
}
