// One saved state of a scenario. Never updated after insert (a database trigger refuses content changes);
// numbers count up from 1 per scenario.
import { Column, Entity, JoinColumn, ManyToOne, Unique } from 'typeorm';
import { AuthoredRecord } from './authored';
import type { ConveyorMode } from '../../../shared/api/scenarios';
import type { Scenario } from '../../../shared/scenario/scenario';

@Entity({ name: 'scenario_revisions' })
@Unique('UQ_scenario_revisions_scenario_number', ['scenarioId', 'number'])
export class ScenarioRevisionEntity extends AuthoredRecord {
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

  /** Set by a database trigger from the document, for lists that must not read documents. */
  @Column({ type: 'text', name: 'conveyor_mode', default: 'carriers', insert: false, update: false })
  conveyorMode!: ConveyorMode;
}
