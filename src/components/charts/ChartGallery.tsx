// Every chart with invented sample data, for looking at them side by side during development and for
// screenshots. Not routed; mount it from a scratch entry when needed.
import { useState } from 'react';
import { CurveWithBand } from './CurveWithBand';
import { DistributionPreview } from './DistributionPreview';
import {
  galleryBalance,
  galleryLanes,
  galleryLeadTimes,
  galleryStateBars,
  galleryStates,
  galleryStations,
  gallerySweep,
  galleryTimeline,
  galleryWip,
} from './gallery-data';
import { Histogram } from './Histogram';
import { LineBalanceChart } from './LineBalanceChart';
import { ShareBars } from './ShareBars';
import { SpaceTimeHeatmap } from './SpaceTimeHeatmap';
import { StationStateBars, type StationSortKey } from './StationStateBars';
import { StationStateTimeline } from './StationStateTimeline';
import { TimeSeriesChart } from './TimeSeriesChart';
import { lognormalLaw, normalLaw } from '../../../workers/analysis/fitted-densities';

const lanes = galleryLanes();
const timeline = galleryTimeline();
const leadTimes = galleryLeadTimes();
const wip = galleryWip();
const SORTS: StationSortKey[] = ['line-order', 'processing', 'blocked', 'name'];

function Panel({ children }: { children: React.ReactNode }) {
  return <section className="rounded-md border border-ink-faint/30 bg-paper-raised p-3 shadow-sm">{children}</section>;
}

export function ChartGallery() {
  const [sortBy, setSortBy] = useState<StationSortKey>('line-order');
  return (
    <div className="mx-auto grid max-w-6xl gap-6 p-6 font-sans text-ink">
      <h1 className="text-xl font-semibold">Chart gallery (invented valve-cartridge line)</h1>
      <Panel>
        <SpaceTimeHeatmap lanes={lanes} timeBinSeconds={120} warmupMinutes={60} />
      </Panel>
      <Panel>
        <StationStateTimeline
          stations={galleryStations}
          timeBinSeconds={240}
          states={galleryStates}
          shares={timeline}
          warmupMinutes={60}
        />
      </Panel>
      <Panel>
        <label className="mb-2 flex items-center gap-2 text-sm text-ink-soft">
          Sort stations by
          <select
            className="rounded border border-ink-faint/50 bg-paper-raised px-1"
            value={sortBy}
            onChange={(event) => setSortBy(event.target.value as StationSortKey)}
          >
            {SORTS.map((key) => (
              <option key={key} value={key}>
                {key}
              </option>
            ))}
          </select>
        </label>
        <StationStateBars stations={galleryStateBars} bottleneckId="fit" bottleneckShare={0.71} sortBy={sortBy} />
      </Panel>
      <Panel>
        <LineBalanceChart steps={galleryBalance} taktSeconds={9.5} />
      </Panel>
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel>
          <Histogram
            values={leadTimes}
            quantity="Lead time"
            unit="min"
            fits={[
              { label: 'lognormal fit', pdf: lognormalLaw(Math.log(6), 0.25).pdf },
              { label: 'normal fit', pdf: normalLaw(6.2, 1.55).pdf },
            ]}
          />
        </Panel>
        <Panel>
          <TimeSeriesChart
            timesMinutes={wip.times}
            series={[{ name: 'WIP', values: wip.values, lower: wip.lower, upper: wip.upper }]}
            quantity="Work in progress"
            unit="parts"
            bandLabel="95 % confidence interval, 10 replications"
            warmupMinutes={60}
          />
        </Panel>
        <Panel>
          <CurveWithBand
            points={gallerySweep}
            xQuantity="Carriers on the track"
            xUnit="count"
            yQuantity="Throughput"
            yUnit="parts/h"
            recommendedX={16}
            recommendedLabel="recommended: 16 carriers"
            reference={{ value: 0.98 * 229.7, label: 'plateau − 2 % tolerance' }}
          />
        </Panel>
        <Panel>
          <ShareBars
            items={[
              { id: 'all', label: 'All carriers', moving: 0.31, waiting: 0.24, working: 0.45 },
              { id: 'c7', label: 'Carrier 7', moving: 0.28, waiting: 0.3, working: 0.42 },
            ]}
          />
        </Panel>
      </div>
      <Panel>
        <h2 className="mb-2 text-base font-semibold">Cycle-time shapes</h2>
        <table className="text-sm">
          <tbody>
            {galleryBalance.map((step) => (
              <tr key={step.id}>
                <td className="pr-4">{step.name}</td>
                <td className="pr-4 tabular-nums">
                  {step.meanCycleSeconds} ± {step.sdCycleSeconds} s
                </td>
                <td>
                  <DistributionPreview
                    label={`Cycle time of ${step.name}`}
                    density={normalLaw(step.meanCycleSeconds, step.sdCycleSeconds).pdf}
                    domain={[
                      step.meanCycleSeconds - 4 * step.sdCycleSeconds,
                      step.meanCycleSeconds + 4 * step.sdCycleSeconds,
                    ]}
                  />
                </td>
              </tr>
            ))}
            <tr>
              <td className="pr-4">Time study (600 samples)</td>
              <td className="pr-4">measured</td>
              <td>
                <DistributionPreview label="Lead time samples" samples={leadTimes} unit="min" />
              </td>
            </tr>
          </tbody>
        </table>
      </Panel>
      <Panel>
        <h2 className="mb-2 text-base font-semibold">Empty and faulty data</h2>
        <div className="grid gap-3 lg:grid-cols-2">
          <Histogram values={[]} quantity="Lead time" unit="min" />
          <LineBalanceChart steps={[{ ...galleryBalance[0], parallelStations: 0 }]} taktSeconds={9.5} />
        </div>
      </Panel>
    </div>
  );
}
