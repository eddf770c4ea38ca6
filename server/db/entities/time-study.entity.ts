// A time study: measured cycle times of one station of a scenario, uploaded as a CSV file. The samples sit
// in a float array that list queries never select; count, mean and sd are copied into plain columns so
// lists show them without reading every sample.
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { TimeStudyAnalysis } from '../../../shared/api/time-studies';
import { AuthoredRecord } from './authored';
import { ScenarioEntity } from './scenario.entity';

@Entity({ name: 'time_studies' })
@Index('IDX_time_studies_scenario_station_created', ['scenarioId', 'stationId', 'createdAt'])
export class TimeStudyEntity extends AuthoredRecord {
  @Column({ type: 'uuid', name: 'scenario_id' })
  scenarioId!: string;

  @ManyToOne(() => ScenarioEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'scenario_id' })
  scenario?: ScenarioEntity;

  /** A station id of the scenario's document; not a foreign key, because stations live inside revisions. */
  @Column({ type: 'text', name: 'station_id' })
  stationId!: string;

  @Column({ type: 'text' })
  name!: string;

  @Column({ type: 'text', name: 'file_name' })
  fileName!: string;

  /** The CSV column the times were read from. */
  @Column({ type: 'text', name: 'sample_column' })
  sampleColumn!: string;

  @Column({ type: 'integer', name: 'sample_count' })
  sampleCount!: number;

  @Column({ type: 'double precision' })
  mean!: number;

  @Column({ type: 'double precision' })
  sd!: number;

  /** Seconds, in file order. */
  @Column({ type: 'double precision', array: true, select: false })
  samples!: number[];

  /** The analysis of the samples, computed once when the study is stored (null for studies stored before). */
  @Column({ type: 'jsonb', nullable: true, select: false })
  analysis!: TimeStudyAnalysis | null;
}
