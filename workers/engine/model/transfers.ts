// Where lanes meet: direct links and transfers (elevators, lateral transfers, curves). A carrier at
// a lane end asks for its next hop. A direct link moves it onto the next lane as soon as that lane's
// start is clear. A transfer holds one carrier: it takes the carrier when idle, carries it for its
// cycle, hands it over when the destination lane's start is clear (blocked until then) and, for
// elevators and lateral transfers, travels back empty before it can take the next one. Requests
// for a lane's start are served in the order they were made.
import { scheduleActive } from '../kernel/clock';
import { CONN_LINK } from './compile';
import { attach, detachFront, entryClear, requestLaneCheck, scheduleEntryWake, setPhase, wake } from './lanes';
import {
  EV_CARRIED,
  EV_RETURNED,
  PH_EXIT,
  PH_QUEUED,
  PH_TRANSFER,
  TR_CARRYING,
  TR_HOLDING,
  TR_IDLE,
  TR_RETURNING,
  type LineState,
} from './state';
import { NONE, type CarrierIndex, type ConnIndex, type LaneIndex } from './indexes';

function setTransferState(m: LineState, conn: ConnIndex, state: number): void {
  m.tState[conn] = state;
  m.observer.transferState(conn, state, m.now);
}

function take(m: LineState, conn: ConnIndex, c: CarrierIndex): void {
  detachFront(m, c);
  setPhase(m, c, PH_TRANSFER);
  m.tCarrier[conn] = c;
  setTransferState(m, conn, TR_CARRYING);
  m.observer.transferMove(conn, m.now);
  scheduleActive(m, m.line.connCarrySeconds[conn], EV_CARRIED, conn);
}

/** The carrier stands at its lane end and needs to leave it. */
export function requestExit(m: LineState, c: CarrierIndex): void {
  const lane = m.cLane[c];
  const conn = m.line.routes.nextHop[lane * m.line.laneCount + m.line.stationLane[m.cTarget[c]]];
  m.cConn[c] = conn;
  setPhase(m, c, PH_EXIT);
  if (m.line.connKind[conn] === CONN_LINK) {
    m.tCarrier[conn] = c;
    m.laneRequests[m.line.connTo[conn]].push(conn);
    requestLaneCheck(m, m.line.connTo[conn]);
  } else if (m.tState[conn] === TR_IDLE) take(m, conn, c);
  else m.tWaiting[conn] = c;
}

export function onCarried(m: LineState, conn: ConnIndex): void {
  setTransferState(m, conn, TR_HOLDING);
  m.laneRequests[m.line.connTo[conn]].push(conn);
  requestLaneCheck(m, m.line.connTo[conn]);
}

export function onReturned(m: LineState, conn: ConnIndex): void {
  setTransferState(m, conn, TR_IDLE);
  const waiting = m.tWaiting[conn];
  if (waiting >= 0) {
    m.tWaiting[conn] = NONE;
    take(m, conn, waiting);
  }
}

/** Moves waiting carriers onto the lane while its start is clear. */
export function serveLane(m: LineState, lane: LaneIndex): void {
  const requests = m.laneRequests[lane];
  while (requests.length > 0 && entryClear(m, lane)) {
    const conn = requests.shift() as ConnIndex;
    const c = m.tCarrier[conn];
    m.tCarrier[conn] = NONE;
    if (m.line.connKind[conn] === CONN_LINK) detachFront(m, c);
    attach(m, c, lane, m.line.carrierLengthMm);
    setPhase(m, c, PH_QUEUED);
    wake(m, c);
    if (m.line.connKind[conn] === CONN_LINK) continue;
    if (m.line.connReturnSeconds[conn] > 0) {
      setTransferState(m, conn, TR_RETURNING);
      scheduleActive(m, m.line.connReturnSeconds[conn], EV_RETURNED, conn);
    } else onReturned(m, conn);
  }
  if (requests.length > 0) scheduleEntryWake(m, lane);
}
