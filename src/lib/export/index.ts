// Public face of the export helpers.
export { downloadCsv, toCsv, csvField, CsvError, FORMULA_TRIGGERS, type CsvColumn, type CsvValue } from './csv';
export { svgToString, downloadSvg, type SvgToStringOptions } from './svg';
export { svgToPngBlob, downloadPng, PngExportError } from './png';
export { collectFontCss } from './fonts';
export { downloadBlob, safeFilename } from './download';
