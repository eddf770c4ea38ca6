import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import stackedLoop from '../../../shared/examples/stacked-loop.json';
import { scenarioSchema } from '../../../shared/scenario/scenario';
import { LayoutDrawing } from '../../../src/components/layout/layout-drawing';
import { layoutModel } from '../../../src/components/layout/layout-model';

const stacked = () => scenarioSchema.parse(stackedLoop);

describe('layout drawing', () => {
  it('draws one lane element per lane with lengths to scale', () => {
    const doc = stacked();
    // A shorter return lane: half the work lane, so the two strips must differ by exactly that ratio.
    doc.lanes[1].modules = [{ lengthMm: 1000, count: 4 }];
    doc.lanes[1].start = { xMm: 6000, yMm: 0 };
    render(<LayoutDrawing document={doc} />);

    const lanes = [...document.querySelectorAll('[data-lane-id]')];
    expect(lanes.map((lane) => lane.getAttribute('data-lane-id'))).toEqual(['work', 'return']);
    const widthOf = (id: string) =>
      Number(document.querySelector(`[data-lane-id="${id}"] rect[data-lane-body]`)?.getAttribute('width'));
    expect(widthOf('work') / widthOf('return')).toBeCloseTo(8000 / 4000, 6);
    expect(lanes.map((lane) => Number(lane.getAttribute('data-length-mm')))).toEqual([8000, 4000]);
  });

  it('draws every station at its lane and reports a click on one as a selection', async () => {
    const onSelect = vi.fn();
    const user = userEvent.setup();
    render(<LayoutDrawing document={stacked()} onSelect={onSelect} />);

    const stationIds = stackedLoop.steps.flatMap((step) => step.stations.map((station) => station.id));
    expect([...document.querySelectorAll('[data-station-id]')].map((s) => s.getAttribute('data-station-id'))).toEqual(
      stationIds,
    );
    await user.click(document.querySelector('[data-station-id="FT2"]') as Element);
    // FT2 is the second station of the fourth step ("fit").
    expect(onSelect).toHaveBeenLastCalledWith({ kind: 'station', stepIndex: 3, stationIndex: 1 });
    await user.click(document.querySelector('[data-lane-id="return"]') as Element);
    expect(onSelect).toHaveBeenLastCalledWith({ kind: 'lane', index: 1 });
  });

  it('gives the stacked loop the footprint and module count worked out by hand from its file', () => {
    // Worked by hand from stacked-loop.json: the work lane runs east from x = 0 and the return lane west
    // from x = 8000, each 8 × 1000 mm, both on y = 0 (stacked), so the plan spans x 0…8000 mm and
    // y −100…100 mm (lane width 200 mm): 8000 × 200 mm, 1.6 m², and 8 + 8 = 16 modules.
    const [work, back] = stackedLoop.lanes;
    const lengthOf = (lane: typeof work) => lane.modules.reduce((sum, m) => sum + m.lengthMm * m.count, 0);
    const xs = [work.start.xMm, work.start.xMm + lengthOf(work), back.start.xMm, back.start.xMm - lengthOf(back)];
    const spanX = Math.max(...xs) - Math.min(...xs);
    const spanY = stackedLoop.track.widthMm;
    const modules = [work, back].reduce((sum, lane) => sum + lane.modules.reduce((n, m) => n + m.count, 0), 0);
    expect([spanX, spanY, modules]).toEqual([8000, 200, 16]);

    const model = layoutModel(stacked());
    expect(model.footprint?.lengthMm).toBe(spanX);
    expect(model.footprint?.widthMm).toBe(spanY);
    expect(model.footprint?.areaM2).toBeCloseTo((spanX * spanY) / 1e6, 9);
    expect(model.moduleCount).toBe(modules);

    render(<LayoutDrawing document={stacked()} />);
    expect(document.querySelector('[data-fact="footprint"]')?.textContent).toBe('8.00 m × 0.20 m');
    expect(document.querySelector('[data-fact="modules"]')?.textContent).toBe('16');
  });

  it('leaves out a lane that is still being typed instead of failing', () => {
    const doc = stacked() as unknown as { lanes: { modules: { lengthMm: unknown }[] }[] };
    doc.lanes[1].modules[0].lengthMm = undefined;
    render(<LayoutDrawing document={doc as never} />);
    expect(document.querySelectorAll('[data-lane-id]')).toHaveLength(1);
    expect(document.body.textContent).toContain('1 lane not drawn');
  });
});
