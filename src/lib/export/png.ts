// PNG export: the stand-alone SVG is drawn onto an offscreen canvas over white, at a chosen scale so
// the picture stays sharp in slides and printed reports.
import { downloadBlob, safeFilename } from './download';
import { collectFontCss } from './fonts';
import { svgToString } from './svg';

/** Browsers refuse canvases past about 16k px a side; staying under keeps the error ours. */
const MAX_CANVAS_SIDE = 16_384;

export class PngExportError extends Error {
  override name = 'PngExportError';
}

export async function svgToPngBlob(svg: SVGSVGElement, scale = 2): Promise<Blob> {
  if (!Number.isFinite(scale) || scale <= 0 || scale > 8) {
    throw new PngExportError(`scale: must be a number above 0 and at most 8, got ${scale}`);
  }
  const width = Number(svg.getAttribute('width')) || svg.getBoundingClientRect().width;
  const height = Number(svg.getAttribute('height')) || svg.getBoundingClientRect().height;
  if (!(width > 0 && height > 0))
    throw new PngExportError('svg: the chart has no size yet; export it once it is shown');
  const pixelWidth = Math.round(width * scale);
  const pixelHeight = Math.round(height * scale);
  if (pixelWidth > MAX_CANVAS_SIDE || pixelHeight > MAX_CANVAS_SIDE) {
    throw new PngExportError(
      `scale: ${scale} makes a ${pixelWidth} × ${pixelHeight} px image, more than ${MAX_CANVAS_SIDE} px a side; choose a smaller scale`,
    );
  }

  const text = svgToString(svg, { fontCss: await collectFontCss(), background: '#ffffff' });
  const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml;charset=utf-8' }));
  try {
    const image = new Image();
    image.src = url;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = pixelWidth;
    canvas.height = pixelHeight;
    const context = canvas.getContext('2d');
    if (!context) throw new PngExportError('canvas: this browser gave no 2D drawing context');
    context.fillStyle = '#ffffff';
    context.fillRect(0, 0, pixelWidth, pixelHeight);
    context.drawImage(image, 0, 0, pixelWidth, pixelHeight);
    return await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob(
        (blob) => (blob ? resolve(blob) : reject(new PngExportError('canvas: the PNG could not be encoded'))),
        'image/png',
      ),
    );
  } finally {
    URL.revokeObjectURL(url);
  }
}

export async function downloadPng(svg: SVGSVGElement, filename: string, scale = 2): Promise<void> {
  downloadBlob(await svgToPngBlob(svg, scale), safeFilename(filename, 'png'));
}
