// What-if ranking on a serial line with one clear bottleneck: only shortening the bottleneck gains
// throughput significantly, and by about its share of time saved, since a line with enough carriers
// runs at its bottleneck's rate (Hopp & Spearman, Factory Physics, 3rd ed. 2008, ch. 7, best case).
import { describe, expect, it } from 'vitest';
import { scenarioSchema } from '../../shared/scenario/scenario';
import { whatIfPoints } from '../../workers/studies/build-points';
import { pointStatistics } from '../../workers/studies/point-statistics';
import { runStudyLocally } from '../../workers/studies/run-study-locally';
import { rankWhatIf } from '../../workers/studies/what-if';
import { loopScenario } from './support/loop-line';

const REVISION = '00000000-0000-4000-8000-000000000002';
const MEANS = [3, 3, 6, 3, 3];

describe('what-if ranking of a serial line with one bottleneck', () => {
  it('only the 6 s press gains significantly, by about 1/0.9 − 1 = 11 %', async () => {
    const doc = loopScenario({
      laneLengthsMm: [6_000, 6_000],
      stations: ['LD', 'P1', 'P2', 'P3', 'UL'].map((id, i) => ({
        id,
        lane: 0,
        positionMm: 1_000 * (i + 1),
        cycle: { kind: 'gamma', mean: MEANS[i], cv: 0.1 },
      })),
      carriers: { count: 12, lengthMm: 160, minGapMm: 40, vMaxMmPerS: 2_000, aMaxMmPerS2: 10_000 },
    });
    const points = whatIfPoints(scenarioSchema.parse(doc), 0.1).map((p, index) => ({
      index,
      label: p.label,
      revisionId: REVISION,
      changes: p.changes ?? [],
    }));
    const settings = { hours: 2, warmupMinutes: 20, replications: 5, seed: 'what-if' };
    const study = await runStudyLocally(
      { id: 'what-if', settings, commonRandomNumbers: true, blockSize: 5, points },
      { [REVISION]: doc },
    );
    const rows = rankWhatIf(pointStatistics(study));
    expect(rows[0].label).toBe('Station P2');
    expect(rows.filter((r) => r.significant).map((r) => r.label)).toEqual(['Station P2']);
    const base = pointStatistics(study)[0].throughput!.mean;
    // The exchange (about 0.28 s per part) is not shortened, so the gain is a little under 11 %.
    expect(rows[0].gain!.mean / base).toBeGreaterThan(0.08);
    expect(rows[0].gain!.mean / base).toBeLessThan(0.112);
    expect(rows[0].bottleneckShare).toBeGreaterThan(0.9);
  }, 120_000);
});
