// Where the carriers stand when a replication starts: all empty, queued at spacing from the lane ends
// backwards, beginning with the lanes that feed the load station (nearest first) and ending with the
// load station's own lane; if the lanes are full, transfers hold one each. The warm-up then brings the
// line to its working state.
import { scheduleActive } from '../kernel/clock';
import { chooseStation } from './dispatch';
import { attach, setPhase, wake } from './lanes';
import { EV_CARRIED, PH_QUEUED, PH_TRANSFER, TR_CARRYING, type LineState } from './state';
import type { CarrierIndex, LaneIndex, StepIndex } from './indexes';

function lanesTowardsLoad(m: LineState): LaneIndex[] {
  const line = m.line;
  const loadLane = line.stationLane[line.stepStations[0][0]];
  const order: LaneIndex[] = [];
  const seen = new Uint8Array(line.laneCount);
  seen[loadLane] = 1;
  const frontier = [loadLane];
  while (frontier.length > 0) {
    const lane = frontier.shift() as LaneIndex;
    for (let k = 0; k < line.connCount; k++) {
      const from = line.connFrom[k];
      if (line.connTo[k] !== lane || seen[from]) continue;
      seen[from] = 1;
      order.push(from);
      frontier.push(from);
    }
  }
  order.push(loadLane);
  return order;
}

function prepare(m: LineState, c: CarrierIndex): void {
  m.cStep[c] = 0 as StepIndex;
  chooseStation(m, 0 as StepIndex, c);
}

export function placeCarriers(m: LineState): void {
  const line = m.line;
  let c = 0 as CarrierIndex;
  for (const lane of lanesTowardsLoad(m)) {
    for (
      let pos = line.laneLengthMm[lane];
      pos >= line.carrierLengthMm - 1e-9 && c < line.carrierCount;
      pos -= line.pitchMm
    ) {
      prepare(m, c);
      attach(m, c, lane, pos);
      setPhase(m, c, PH_QUEUED);
      wake(m, c);
      c = (c + 1) as CarrierIndex;
    }
  }
  for (let k = 0; k < line.connCount && c < line.carrierCount; k++) {
    if (line.connTransfer[k] < 0) continue;
    prepare(m, c);
    setPhase(m, c, PH_TRANSFER);
    m.tCarrier[k] = c;
    m.tState[k] = TR_CARRYING;
    m.observer.transferState(k, TR_CARRYING, m.now);
    scheduleActive(m, 0, EV_CARRIED, k);
    c = (c + 1) as CarrierIndex;
  }
  if (c < line.carrierCount) {
    throw new RangeError(
      `${line.carrierCount} carriers do not fit on the track reachable from loading; at most ${c} do`,
    );
  }
}
