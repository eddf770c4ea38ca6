// Carrier, station, lane, step and connection indexes are branded at the type level: swapping two of
// them is a compile error (checked by `tsc --noEmit`, which fails on an unused @ts-expect-error), and
// costs nothing at run time (they are plain numbers).
import { describe, expect, it } from 'vitest';
import { chooseStation } from '../../workers/engine/model/dispatch';
import {
  NONE,
  type CarrierIndex,
  type ConnIndex,
  type LaneIndex,
  type StationIndex,
  type StepIndex,
} from '../../workers/engine/model/indexes';
import { attach, positionAt } from '../../workers/engine/model/lanes';
import type { LineState } from '../../workers/engine/model/state';
import { arriveAtStation } from '../../workers/engine/model/stations';
import { onCarried, serveLane } from '../../workers/engine/model/transfers';

describe('branded indexes of the line model', () => {
  it('swapped or mixed-up indexes do not compile', () => {
    const uses = (
      m: LineState,
      c: CarrierIndex,
      s: StationIndex,
      lane: LaneIndex,
      step: StepIndex,
      conn: ConnIndex,
    ) => {
      arriveAtStation(m, c, s);
      // @ts-expect-error a station where the carrier is due, and the carrier where the station is
      arriveAtStation(m, s, c);
      attach(m, c, lane, 0);
      // @ts-expect-error a station index is not a lane index
      attach(m, c, s, 0);
      chooseStation(m, step, c);
      // @ts-expect-error step and carrier swapped
      chooseStation(m, c, step);
      onCarried(m, conn);
      // @ts-expect-error a lane is not a connection
      onCarried(m, lane);
      serveLane(m, lane);
      // @ts-expect-error a plain number must be made an index at the edge, on purpose
      positionAt(m, 3, 0);
    };
    expect(typeof uses).toBe('function');
  });

  it('an index is a plain number at run time', () => {
    const c = 7 as CarrierIndex;
    expect(c + 1).toBe(8);
    expect(NONE).toBe(-1);
  });
});
