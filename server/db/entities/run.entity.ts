// A stored simulation run, tied to the exact revision it was computed from. Headline numbers sit in plain
// columns so lists sort and filter without reading the bulky `results` JSON, which list queries never select.
import { Column, Entity, Index, JoinColumn, ManyToOne, Unique } from 'typeorm';
import { EditableRecord } from './authored';
import type { RunSummary } from '../../../shared/api/runs';
import type { RunResult } from '../../../shared/results/run-result';
import type { RunSettings } from '../../../shared/scenario/run-settings';
import { ScenarioRevisionEntity } from './scenario-revision.entity';
import { ScenarioEntity } from './scenario.entity';

@Entity({ name: 'runs' })
@Unique('UQ_runs_scenario_client_run', ['scenarioId', 'clientRunId'])
@Index('IDX_runs_scenario_created', ['scenarioId', 'createdAt'])
@Index('IDX_runs_revision', ['revisionId'])
@Index('IDX_runs_created_by', ['createdById'])
export class RunEntity extends EditableRecord {
  @Column({ type: 'uuid', name: 'scenario_id' })
  scenarioId!: string;

  @ManyToOne(() => ScenarioEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'scenario_id' })
  scenario?: ScenarioEntity;

  @Column({ type: 'uuid', name: 'revision_id' })
  revisionId!: string;

  @ManyToOne(() => ScenarioRevisionEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'revision_id' })
  revision?: ScenarioRevisionEntity;

  @Column({ type: 'uuid', name: 'client_run_id' })
  clientRunId!: string;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'jsonb' })
  settings!: RunSettings;

  @Column({ type: 'text' })
  seed!: string;

  @Column({ type: 'text', name: 'engine_version' })
  engineVersion!: string;

  @Column({ type: 'double precision', name: 'throughput_per_hour_mean' })
  throughputPerHourMean!: number;

  @Column({ type: 'double precision', name: 'takt_seconds_mean' })
  taktSecondsMean!: number;

  @Column({ type: 'integer' })
  carriers!: number;

  /** The whole headline block (intervals, annual output, bottleneck): small, returned in lists. */
  @Column({ type: 'jsonb' })
  summary!: RunSummary;

  @Column({ type: 'jsonb', select: false })
  results!: RunResult;

  /**
   * Whether the server recomputed this result itself. Results posted by a browser are stored as sent
   * (false); runs the server simulates set it.
   */
  @Column({ type: 'boolean', name: 'server_checked', default: false })
  serverChecked!: boolean;
}
