// CSV exports name the break state by its meaning, in the snake case of every other column.
import { describe, expect, it } from 'vitest';
import { STATION_STATES, stateCsvName } from '../../../src/components/charts/palette';
import { timelineCsv } from '../../../src/components/charts/StationStateTimeline';

describe('station state columns in CSV exports', () => {
  it('calls the break column on_break_share', () => {
    const table = timelineCsv(
      [{ id: 'PR', name: 'Press' }],
      [...STATION_STATES],
      STATION_STATES.map(() => 0.2),
      1,
      0,
      0.5,
    );
    expect(table.columns).toEqual([
      'station_id',
      'station',
      'time_start_min',
      'processing_share',
      'starved_share',
      'blocked_share',
      'down_share',
      'on_break_share',
    ]);
    expect(stateCsvName('onBreak')).toBe('on_break');
  });
});
