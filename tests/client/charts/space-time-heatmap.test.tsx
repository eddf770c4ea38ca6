import { render, screen } from '@testing-library/react';
import { interpolateYlGnBu } from 'd3';
import { inflateSync } from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { SpaceTimeHeatmap } from '../../../src/components/charts/SpaceTimeHeatmap';
import { axisLabel, hoverAt, legendLabels, tooltipRows, WIDTH } from './chart-test-helpers';

/** Reads width, height and RGB pixels back from a PNG data URL with Node's own zlib. */
function decodePng(dataUrl: string) {
  const bytes = Buffer.from(dataUrl.replace('data:image/png;base64,', ''), 'base64');
  const width = bytes.readUInt32BE(16);
  const height = bytes.readUInt32BE(20);
  const idatLength = bytes.readUInt32BE(33);
  const raw = inflateSync(bytes.subarray(41, 41 + idatLength));
  const pixel = (x: number, y: number) => {
    const at = y * (1 + width * 3) + 1 + x * 3;
    return [raw[at], raw[at + 1], raw[at + 2]];
  };
  return { width, height, pixel };
}

const rgb = (colour: string) => colour.match(/\d+/g)!.map(Number);

// 1000 mm in 250 mm bins = 4 positions; 3 time bins of one minute.
const laneA = {
  laneName: 'Work lane',
  lengthMm: 1000,
  positionBinMm: 250,
  values: [0, 0.25, 1, 0, 0.5, 0.6, 1, 0, 0, 0, 1, 0.125],
};
const laneB = {
  laneName: 'Return lane',
  lengthMm: 1000,
  positionBinMm: 250,
  values: [0, 0, 0, 0, 0.1, 0, 0, 0, 0, 0, 0, 0],
};

describe('SpaceTimeHeatmap', () => {
  it('draws one image per lane with one pixel per time bin and position bin, coloured from the shared scale', () => {
    const { container } = render(<SpaceTimeHeatmap lanes={[laneA, laneB]} timeBinSeconds={60} width={WIDTH} />);
    const images = container.querySelectorAll('image');
    expect(images).toHaveLength(2);
    const png = decodePng(images[0].getAttribute('href')!);
    expect([png.width, png.height]).toEqual([3, 4]);
    // Image rows run from the far end of the lane down to 0 mm: row 3 is position bin 0.
    expect(png.pixel(0, 1)).toEqual(rgb(interpolateYlGnBu(1))); // time bin 0, position bin 2
    expect(png.pixel(0, 3)).toEqual(rgb(interpolateYlGnBu(0)));
    png
      .pixel(1, 2)
      .forEach((channel, i) => expect(Math.abs(channel - rgb(interpolateYlGnBu(0.6))[i])).toBeLessThanOrEqual(2));
  });

  it('labels both axes with units, names each lane and explains the colour', () => {
    const { container } = render(
      <SpaceTimeHeatmap lanes={[laneA, laneB]} timeBinSeconds={60} warmupMinutes={1} width={WIDTH} />,
    );
    expect(axisLabel(container, 'x')).toEqual(['Simulated time (min)']);
    expect(axisLabel(container, 'y')).toContain('Position (mm)');
    expect(container.querySelectorAll('[data-lane]')).toHaveLength(2);
    expect(legendLabels(container)).toEqual([
      'Share of time a carrier occupies this place',
      'warm-up, 1 min (not in statistics)',
    ]);
    expect(screen.getByRole('img').getAttribute('aria-label')).toMatch(
      /Work lane is busiest at 500–750 mm \(mean 100\.0% occupied\)/,
    );
  });

  it('shows the exact share of the cell under the pointer', () => {
    const { container } = render(<SpaceTimeHeatmap lanes={[laneA]} timeBinSeconds={60} width={WIDTH} />);
    const hit = container.querySelector('[data-chart-part="hit-area"]')!;
    const width = Number(hit.getAttribute('width'));
    const height = Number(hit.getAttribute('height'));
    // Middle of time bin 1, position bin 1 (second from the bottom, so third row from the top).
    hoverAt(hit, width * (1.5 / 3), height * (2.5 / 4));
    expect(tooltipRows()).toEqual({ Time: '1.0–2.0 min', Position: '250–500 mm', Occupied: '60.0%' });
  });

  it('averages time bins that would be narrower than a pixel, and says so in the tooltip', () => {
    const long = {
      ...laneB,
      values: Array.from({ length: 300 * 4 }, (_, i) => (Math.floor(i / 4) % 3 === 0 ? 0.9 : 0)),
    };
    const { container } = render(<SpaceTimeHeatmap lanes={[long]} timeBinSeconds={60} width={200} />);
    const image = container.querySelector('image')!;
    const hit = container.querySelector('[data-chart-part="hit-area"]')!;
    const columns = Number(image.getAttribute('data-columns'));
    expect(columns).toBeLessThanOrEqual(Number(hit.getAttribute('width')));
    hoverAt(hit, 1, 1);
    const rows = tooltipRows();
    const merged = Object.keys(rows).find((key) => key.startsWith('Occupied (mean of'))!;
    expect(merged).toBe(`Occupied (mean of ${Math.ceil(300 / columns)} bins)`);
    expect(rows[merged]).toBe('30.0%');
  });

  it('offers a screen-reader table of mean and highest share per place', () => {
    render(<SpaceTimeHeatmap lanes={[laneA]} timeBinSeconds={60} width={WIDTH} />);
    const table = screen.getByRole('table');
    expect(table.querySelectorAll('tbody tr')).toHaveLength(4);
    expect(table.querySelector('tbody tr:nth-child(3)')!.textContent).toBe(
      'Work lane500–750' + '100.0%' + '100.0%' + '0.0',
    );
  });

  it('explains an empty run instead of drawing an empty frame', () => {
    render(<SpaceTimeHeatmap lanes={[]} timeBinSeconds={60} width={WIDTH} />);
    expect(screen.getByRole('status').textContent).toMatch(/No track occupancy was recorded/);
    expect(screen.queryByRole('img')).toBeNull();
  });

  it('names the field when the values do not fit the lane geometry or lie outside 0..1', () => {
    const { rerender } = render(
      <SpaceTimeHeatmap lanes={[laneA, { ...laneB, values: laneB.values.slice(1) }]} timeBinSeconds={60} />,
    );
    expect(screen.getByRole('alert').textContent).toMatch(
      /lanes\[1\]\.values has 11 entries, not a whole number of time bins of 4 position bins/,
    );
    rerender(
      <SpaceTimeHeatmap lanes={[{ ...laneA, values: [...laneA.values.slice(0, 11), 1.4] }]} timeBinSeconds={60} />,
    );
    expect(screen.getByRole('alert').textContent).toMatch(
      /lanes\[0\]\.values\[11\] is 1\.4, above the highest allowed value/,
    );
    rerender(<SpaceTimeHeatmap lanes={[laneA]} timeBinSeconds={0} />);
    expect(screen.getByRole('alert').textContent).toMatch(/timeBinSeconds must be a number above zero/);
  });
});
