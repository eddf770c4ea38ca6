// The live drawing of a (draft) layout: key figures, a plan per deck on one shared scale, and a side
// elevation. Clicking a lane or a station reports it, so the editor can open it.
import { useMemo } from 'react';
import { BeltBaselineTag } from '../ui/belt-baseline-tag';
import { formatCount, formatLengthMm } from '../../lib/format';
import { planFrame } from './drawing-frame';
import { ElevationView } from './elevation-view';
import { layoutModel, type LayoutDraft } from './layout-model';
import type { OverlaySpec } from './overlay-canvas';
import { PlanView } from './plan-view';
import type { LayoutSelection } from './selection';

export interface LayoutDrawingProps {
  document: LayoutDraft;
  selection?: LayoutSelection;
  onSelect?: (selection: LayoutSelection) => void;
  /** A canvas over the track of every deck's plan and of the side elevation, for a playback to draw on. */
  overlay?: OverlaySpec;
}

const metres = (mm: number) =>
  `${(mm / 1000).toLocaleString('en-GB', { minimumFractionDigits: 2, maximumFractionDigits: 2 })} m`;

function Fact({ label, value, name }: { label: string; value: string; name: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-xs font-semibold tracking-wide text-ink-soft uppercase">{label}</dt>
      <dd className="text-lg font-semibold text-ink tabular-nums" data-fact={name}>
        {value}
      </dd>
    </div>
  );
}

export function LayoutDrawing({ document, selection = null, onSelect, overlay }: LayoutDrawingProps) {
  const model = useMemo(() => layoutModel(document), [document]);
  const frame = model.footprint ? planFrame(model.footprint.box) : null;
  const print = model.footprint;
  return (
    <div className="flex flex-col gap-4" data-layout-drawing>
      {document.conveyor?.kind === 'belt' && (
        <p className="flex flex-wrap items-center gap-2 text-sm text-ink-soft">
          <BeltBaselineTag />
          Drawn on the same track as the carrier layouts; pallets ride a constant-speed belt instead.
        </p>
      )}
      <dl className="grid grid-cols-2 gap-4 sm:grid-cols-4">
        <Fact
          name="footprint"
          label="Footprint"
          value={print ? `${metres(print.lengthMm)} × ${metres(print.widthMm)}` : '—'}
        />
        <Fact
          name="area"
          label="Floor area"
          value={print ? `${print.areaM2.toLocaleString('en-GB', { maximumFractionDigits: 2 })} m²` : '—'}
        />
        <Fact name="modules" label="Track modules" value={model.moduleCount.toLocaleString('en-GB')} />
        <Fact name="track-length" label="Track length" value={formatLengthMm(model.trackLengthMm)} />
      </dl>
      {model.undrawnLanes.length > 0 && (
        <p className="text-sm text-caution">
          {formatCount(model.undrawnLanes.length, 'lane')} not drawn until{' '}
          {model.undrawnLanes.length === 1 ? 'its' : 'their'} modules, start point and heading are complete.
        </p>
      )}
      {frame ? (
        model.decks.map((deck) => (
          <PlanView
            key={deck.id}
            model={model}
            deck={deck}
            frame={frame}
            selection={selection}
            onSelect={onSelect}
            overlay={overlay}
          />
        ))
      ) : (
        <p className="rounded-md border border-dashed border-ink-faint p-6 text-center text-ink-soft">
          Nothing to draw yet: add a lane with modules, a start point and a heading.
        </p>
      )}
      <ElevationView model={model} overlay={overlay} />
      <p className="text-xs text-ink-soft">
        Filled circles are automatic stations, hollow ones manual. Joint ticks mark module ends; chevrons show the
        direction of travel; squares mark elevator ends and lateral transfers.
      </p>
    </div>
  );
}
