// Turns a chart's live SVG into a file that stands alone: the styles the page applied are copied onto
// each element, CSS classes (meaningless without the page) are dropped, and fonts can be embedded.
import { downloadBlob, safeFilename } from './download';
import { collectFontCss } from './fonts';

const SVG_NS = 'http://www.w3.org/2000/svg';

/** Properties that change how SVG draws; anything else the page's CSS sets does not matter here. */
const STYLE_PROPERTIES = [
  'fill',
  'fill-opacity',
  'stroke',
  'stroke-width',
  'stroke-dasharray',
  'stroke-opacity',
  'stroke-linecap',
  'stroke-linejoin',
  'opacity',
  'font-family',
  'font-size',
  'font-weight',
  'font-style',
  'text-anchor',
  'dominant-baseline',
  'visibility',
  'display',
  'image-rendering',
] as const;

/** Values equal to the SVG initial value are left out to keep files small. */
const INITIAL_VALUES: Partial<Record<(typeof STYLE_PROPERTIES)[number], string>> = {
  'fill-opacity': '1',
  'stroke-opacity': '1',
  opacity: '1',
  'stroke-dasharray': 'none',
  'stroke-linecap': 'butt',
  'stroke-linejoin': 'miter',
  'font-style': 'normal',
  visibility: 'visible',
  display: 'inline',
  'image-rendering': 'auto',
};

export interface SvgToStringOptions {
  /** @font-face rules (usually with data URLs) placed in the file so text keeps its typeface. */
  fontCss?: string;
  /** A colour painted behind everything; PNG export uses white. */
  background?: string;
}

function inlineStyles(original: Element, copy: Element): void {
  const computed = getComputedStyle(original);
  const declarations: string[] = [];
  for (const property of STYLE_PROPERTIES) {
    const value = computed.getPropertyValue(property).trim();
    if (value && value !== INITIAL_VALUES[property]) declarations.push(`${property}:${value}`);
  }
  const own = copy.getAttribute('style');
  if (own) declarations.push(own);
  if (declarations.length > 0) copy.setAttribute('style', declarations.join(';'));
  copy.removeAttribute('class');
}

export function svgToString(svg: SVGSVGElement, options: SvgToStringOptions = {}): string {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  const originals = [svg, ...Array.from(svg.querySelectorAll('*'))];
  const copies = [copy, ...Array.from(copy.querySelectorAll('*'))];
  originals.forEach((element, i) => inlineStyles(element, copies[i]));

  copy.setAttribute('xmlns', SVG_NS);
  copy.setAttribute('xmlns:xlink', 'http://www.w3.org/1999/xlink');
  // A stand-alone file needs a size of its own; the page may have sized the chart through CSS only.
  const box = svg.getBoundingClientRect();
  if (!copy.getAttribute('width') && box.width > 0) copy.setAttribute('width', String(box.width));
  if (!copy.getAttribute('height') && box.height > 0) copy.setAttribute('height', String(box.height));

  const childTitle = () => Array.from(copy.children).find((child) => child.tagName.toLowerCase() === 'title');
  const label = svg.getAttribute('aria-label');
  if (label && !childTitle()) {
    const title = document.createElementNS(SVG_NS, 'title');
    title.textContent = label;
    copy.prepend(title);
  }
  if (options.background) {
    const rect = document.createElementNS(SVG_NS, 'rect');
    rect.setAttribute('width', '100%');
    rect.setAttribute('height', '100%');
    rect.setAttribute('fill', options.background);
    copy.insertBefore(rect, childTitle()?.nextSibling ?? copy.firstChild);
  }
  if (options.fontCss) {
    const style = document.createElementNS(SVG_NS, 'style');
    style.textContent = options.fontCss;
    copy.prepend(style);
  }
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(copy)}`;
}

export async function downloadSvg(svg: SVGSVGElement, filename: string): Promise<void> {
  const text = svgToString(svg, { fontCss: await collectFontCss() });
  downloadBlob(new Blob([text], { type: 'image/svg+xml;charset=utf-8' }), safeFilename(filename, 'svg'));
}
