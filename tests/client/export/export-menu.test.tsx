import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ShareBars } from '../../../src/components/charts/ShareBars';
import { safeFilename } from '../../../src/lib/export/download';

function captureDownloads() {
  const saved: Array<{ name: string; blob: Blob }> = [];
  const blobs = new Map<string, Blob>();
  vi.spyOn(URL, 'createObjectURL').mockImplementation((blob) => {
    const url = `blob:test/${blobs.size}`;
    blobs.set(url, blob as Blob);
    return url;
  });
  vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
  vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
    saved.push({ name: this.download, blob: blobs.get(this.href)! });
  });
  return saved;
}

afterEach(() => vi.useRealTimers());

const items = [{ id: 'all', label: 'All carriers, fleet', moving: 0.3, waiting: 0.25, working: 0.45 }];

describe('ChartExportMenu', () => {
  it('saves the chart data as CSV with a byte order mark, CRLF records and quoted commas', async () => {
    const saved = captureDownloads();
    render(<ShareBars items={items} width={600} exportName="carrier shares: run 12" />);
    fireEvent.click(screen.getByRole('button', { name: 'Save the data of How carriers spend their time as CSV' }));
    await waitFor(() => expect(saved).toHaveLength(1));
    expect(saved[0].name).toBe('carrier-shares-run-12.csv');
    const bytes = new Uint8Array(await saved[0].blob.arrayBuffer());
    expect(Array.from(bytes.subarray(0, 3))).toEqual([0xef, 0xbb, 0xbf]);
    expect(new TextDecoder().decode(bytes.subarray(3))).toBe(
      'id,name,working_share,moving_share,waiting_share,note\r\nall,"All carriers, fleet",0.45,0.3,0.25,\r\n',
    );
  });

  it('saves the picture as a stand-alone SVG file', async () => {
    const saved = captureDownloads();
    render(<ShareBars items={items} width={600} />);
    fireEvent.click(screen.getByRole('button', { name: 'Save How carriers spend their time as SVG' }));
    await waitFor(() => expect(saved).toHaveLength(1));
    expect(saved[0].name).toBe('carrier-time-shares.svg');
    expect(saved[0].blob.type).toBe('image/svg+xml;charset=utf-8');
    expect(await saved[0].blob.text()).toContain('<title>How carriers spend their time.');
  });

  it('reports a PNG export that the browser cannot draw instead of failing silently', async () => {
    captureDownloads();
    vi.spyOn(HTMLImageElement.prototype, 'decode').mockRejectedValue(new Error('the image could not be decoded'));
    render(<ShareBars items={items} width={600} />);
    fireEvent.click(screen.getByRole('button', { name: 'Save How carriers spend their time as PNG' }));
    expect((await screen.findByRole('alert')).textContent).toBe('Export failed: the image could not be decoded');
  });
});

describe('safeFilename', () => {
  it('keeps letters and digits of any script and replaces the rest', () => {
    expect(safeFilename('Linie Süd / Lauf 3', 'png')).toBe('Linie-Süd-Lauf-3.png');
    expect(safeFilename('report.csv', 'csv')).toBe('report.csv');
    expect(safeFilename('***', 'svg')).toBe('lanewright-export.svg');
  });
});
