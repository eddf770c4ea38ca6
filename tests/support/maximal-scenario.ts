// A scenario document with every list at its schema limit and every text at its longest, built to fit
// the line checks (one closed loop of lanes, stations spaced a carrier pitch apart). Numbers are written
// at full double precision, so its JSON is as long as a legitimate document gets.
import { CARRIER_LIMITS } from '../../shared/scenario/carriers';
import { CALENDAR_LIMITS } from '../../shared/scenario/calendar';
import { DISTRIBUTION_LIMITS } from '../../shared/scenario/distribution';
import { PROCESS_LIMITS } from '../../shared/scenario/process';
import { TRACK_LIMITS } from '../../shared/scenario/track';

const id = (prefix: string, i: number) => `${prefix}-${String(i).padStart(36 - prefix.length, '0')}`.slice(0, 40);
const label = (text: string) => text.padEnd(120, '.');
/** 17 significant digits: the longest decimal a double needs. */
const precise = (i: number) => 10 + ((i * 7919) % 1000) / 1000 + 0.00012345678901234;

export function maximalScenario(): Record<string, unknown> {
  const lanes = TRACK_LIMITS.lanesMax;
  const moduleMm = 1000;
  const modulesPerLane = TRACK_LIMITS.moduleRunsPerLaneMax;
  const stepCount = PROCESS_LIMITS.stepsMax;
  const stationCount = PROCESS_LIMITS.stationsMax;
  const samplesPerStudy = DISTRIBUTION_LIMITS.empiricalSamplesMax / 5;
  const studies = PROCESS_LIMITS.empiricalSamplesTotalMax / samplesPerStudy;
  // Stations in document order walk along the loop, a few per lane, 1 m apart.
  const stationsOfStep = (step: number) => {
    const base = Math.floor(stationCount / stepCount);
    const extra = step < stationCount % stepCount ? 1 : 0;
    return base + extra;
  };
  let station = 0;
  const steps = Array.from({ length: stepCount }, (_, s) => {
    const kind = s === 0 ? 'load' : s === stepCount - 1 ? 'unload' : 'process';
    const stations = Array.from({ length: stationsOfStep(s) }, () => {
      const n = station++;
      const lane = Math.floor(n / 3);
      const cycleTimeSeconds =
        n < studies
          ? { kind: 'empirical', samples: Array.from({ length: samplesPerStudy }, (_, k) => precise(k + n)) }
          : { kind: 'fixed', value: precise(n) };
      return {
        id: id('st', n),
        name: label(`Station ${n}`),
        laneId: id('lane', lane),
        positionMm: 1000 + (n % 3) * 1000,
        cycleTimeSeconds,
        operation: 'automatic',
        pausesForBreaks: false,
      };
    });
    return { id: id('step', s), name: label(`Step ${s}`), kind, dispatch: 'firstFree', stations };
  });
  return {
    schemaVersion: 1,
    name: label('Maximal line'),
    description: 'd'.repeat(2000),
    track: {
      moduleLengthsMm: Array.from({ length: TRACK_LIMITS.moduleLengthsMax }, (_, i) => moduleMm + i * 10),
      widthMm: 200,
    },
    decks: Array.from({ length: TRACK_LIMITS.decksMax }, (_, i) => ({
      id: id('deck', i),
      name: label(`Deck ${i}`),
      elevationMm: 500 + i * 100,
    })),
    lanes: Array.from({ length: lanes }, (_, i) => ({
      id: id('lane', i),
      name: label(`Lane ${i}`),
      deckId: id('deck', 0),
      modules: Array.from({ length: modulesPerLane }, () => ({ lengthMm: moduleMm, count: 1 })),
      start: { xMm: (i % 20) * 1000 - 500_000, yMm: Math.floor(i / 20) * 1000 - 500_000 },
      heading: 'east',
    })),
    links: Array.from({ length: lanes }, (_, i) => ({
      fromLaneId: id('lane', i),
      toLaneId: id('lane', (i + 1) % lanes),
    })),
    transfers: [],
    carriers: {
      count: CARRIER_LIMITS.countMax,
      lengthMm: 160,
      minGapMm: 40,
      loaded: { vMaxMmPerS: 2000, aMaxMmPerS2: 10000 },
      empty: { vMaxMmPerS: 2500, aMaxMmPerS2: 20000 },
    },
    steps,
    calendar: {
      shiftsPerDay: 1,
      hoursPerShift: 8,
      breaks: Array.from({ length: CALENDAR_LIMITS.breaksPerShiftMax }, (_, i) => ({
        startMinute: i * 20,
        minutes: 5,
      })),
      daysPerWeek: 5,
      weeksPerYear: 46,
    },
    targetTaktSeconds: 10,
    conveyor: { kind: 'carriers' },
  };
}
