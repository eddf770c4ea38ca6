// The two pictures of a run over time: carriers along each lane, and what each station was doing.
import type { RunResult } from '../../../../shared/results/run-result';
import { SpaceTimeHeatmap, StationStateTimeline } from '../../../components/charts';
import { Card, CardTitle } from '../../../components/ui/card';
import { spaceTimeLanes, stationTimeline } from '../utils/chart-data';

export function HeatmapResults({ result, fileBase }: { result: RunResult; fileBase: string }) {
  const timeline = stationTimeline(result);
  const replications = result.settings.replications;
  return (
    <Card aria-labelledby="heatmaps-title" className="flex flex-col gap-6">
      <div className="flex flex-col gap-1">
        <CardTitle id="heatmaps-title">Over time</CardTitle>
        <p className="max-w-prose text-sm text-ink-soft">
          Time counts from the start of the simulation; statistics begin after the {result.settings.warmupMinutes} min
          warm-up. Each cell is the mean over {replications} replication{replications === 1 ? '' : 's'}.
        </p>
      </div>
      <SpaceTimeHeatmap
        lanes={spaceTimeLanes(result)}
        timeBinSeconds={result.heatmaps.binSeconds}
        startMinutes={result.heatmaps.startSeconds / 60}
        exportName={`${fileBase}-space-time`}
      />
      <StationStateTimeline
        stations={timeline.stations}
        states={timeline.states}
        shares={timeline.shares}
        timeBinSeconds={timeline.timeBinSeconds}
        startMinutes={timeline.startMinutes}
        exportName={`${fileBase}-station-timeline`}
      />
    </Card>
  );
}
