// One saved state of a scenario. Never updated after insert (a database trigger refuses content changes);
// numbers count up from 1 per scenario.
import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, Unique } from 'typeorm';
import type { Scenario } from '../../../shared/scenario/scenario';
import { UserEntity } from './user.entity';

@Entity({ name: 'scenario_revisions' })
@Unique('UQ_scenario_revisions_scenario_number', ['scenarioId', 'number'])
export class ScenarioRevisionEntity {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid', name: 'scenario_id' })
  scenarioId!: string;

  @ManyToOne('ScenarioEntity', { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'scenario_id' })
  scenario?: object;

  @Column({ type: 'integer' })
  number!: number;

  @Column({ type: 'jsonb' })
  document!: Scenario;

  @Column({ type: 'text', default: '' })
  message!: string;

  @Column({ type: 'uuid', name: 'created_by_id', nullable: true })
  createdById!: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'created_by_id' })
  createdBy?: UserEntity | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt!: Date;
}
