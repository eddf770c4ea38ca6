import { render } from '@testing-library/react';
import { SaxesParser } from 'saxes';
import { describe, expect, it } from 'vitest';
import { LineBalanceChart } from '../../../src/components/charts/LineBalanceChart';
import { SpaceTimeHeatmap } from '../../../src/components/charts/SpaceTimeHeatmap';
import { svgToString } from '../../../src/lib/export/svg';

interface Parsed {
  root: { name: string; attributes: Record<string, string> };
  elements: string[];
  texts: string[];
}

/** Parses with saxes, a strict XML 1.0 parser: any well-formedness error throws. */
function parseXml(text: string): Parsed {
  const parser = new SaxesParser({ xmlns: true });
  const parsed: Parsed = { root: { name: '', attributes: {} }, elements: [], texts: [] };
  parser.on('error', (error) => {
    throw error;
  });
  parser.on('opentag', (tag) => {
    if (!parsed.root.name)
      parsed.root = {
        name: tag.local,
        attributes: Object.fromEntries(Object.values(tag.attributes).map((a) => [a.name, a.value])),
      };
    parsed.elements.push(tag.local);
  });
  parser.on('text', (text) => parsed.texts.push(text));
  parser.write(text).close();
  return parsed;
}

const steps = [
  { id: 'a', name: 'Press & seal <left>', meanCycleSeconds: 9, sdCycleSeconds: 1, parallelStations: 1 },
  { id: 'b', name: 'Fitting "manual"', meanCycleSeconds: 20, sdCycleSeconds: 2, parallelStations: 2 },
];

describe('svgToString', () => {
  it('produces well-formed XML with the SVG namespace, a size and the chart summary as its title', () => {
    const { container } = render(<LineBalanceChart steps={steps} taktSeconds={10} width={640} />);
    const text = svgToString(container.querySelector('svg')!);
    expect(text.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
    const parsed = parseXml(text);
    expect(parsed.root.name).toBe('svg');
    expect(parsed.root.attributes.xmlns).toBe('http://www.w3.org/2000/svg');
    expect(Number(parsed.root.attributes.width)).toBe(640);
    expect(Number(parsed.root.attributes.height)).toBeGreaterThan(100);
    expect(parsed.elements[1]).toBe('title');
    expect(parsed.texts).toContain('Press & seal <left>');
    expect(parsed.texts).toContain('takt 10.00 s');
  });

  it('drops page CSS classes, keeps the hatch pattern the bars refer to and adds fonts and background on request', () => {
    const { container } = render(<LineBalanceChart steps={steps} taktSeconds={10} width={640} />);
    const fontCss = '@font-face{font-family:"IBM Plex Sans";src:url(data:font/woff2;base64,AAAA) format("woff2");}';
    const text = svgToString(container.querySelector('svg')!, { fontCss, background: '#ffffff' });
    const parsed = parseXml(text);
    expect(text).not.toContain('class=');
    expect(parsed.elements.slice(1, 4)).toEqual(['style', 'title', 'rect']);
    expect(parsed.texts).toContain(fontCss);
    const hatchId = /fill="url\(#(over-takt-[^)]+)\)"/.exec(text)![1];
    expect(text).toContain(`<pattern id="${hatchId}"`);
  });

  it('keeps the heatmap raster embedded as a data URL so the file stands alone', () => {
    const lane = { laneName: 'Lane', lengthMm: 500, positionBinMm: 250, values: [0, 1, 0.5, 0.5] };
    const { container } = render(<SpaceTimeHeatmap lanes={[lane]} timeBinSeconds={60} width={640} />);
    const text = svgToString(container.querySelector('svg')!);
    parseXml(text);
    expect(text).toMatch(/<image [^>]*href="data:image\/png;base64,/);
  });
});
