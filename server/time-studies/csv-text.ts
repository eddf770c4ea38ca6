// Turns an uploaded file's bytes into CSV text and refuses what is not a CSV: the wrong extension, binary
// content, or more than the size limit. Every refusal names the file and says what to upload instead.
import { TIME_STUDY_LIMITS } from '../../shared/api/time-studies';
import { HttpError } from '../http/http-error';

export function formatMegabytes(bytes: number): string {
  const mb = bytes / (1024 * 1024);
  return `${mb >= 10 ? mb.toFixed(0) : mb.toFixed(1)} MB`;
}

export const LIMIT_TEXT = formatMegabytes(TIME_STUDY_LIMITS.fileBytes).replace('.0 ', ' ');

/** `bytes` is the upload's declared length where multer stopped reading; null when it was not declared. */
export function fileTooLarge(bytes: number | null): HttpError {
  let size = bytes === null ? `over ${LIMIT_TEXT}` : formatMegabytes(bytes);
  // Just past the limit, rounding to a tenth would claim the file is exactly the limit.
  if (bytes !== null && bytes < 1.05 * TIME_STUDY_LIMITS.fileBytes)
    size = `over ${LIMIT_TEXT} (the upload is ${bytes.toLocaleString('en-GB')} bytes)`;
  return new HttpError(
    413,
    'payload_too_large',
    `The file is ${size}; the limit is ${LIMIT_TEXT}. Split the time study or thin it out.`,
    [{ path: 'file', message: `is ${size}; the limit is ${LIMIT_TEXT}` }],
  );
}

function unsupported(message: string, field: string): HttpError {
  return new HttpError(415, 'unsupported_media_type', message, [{ path: 'file', message: field }]);
}

/** Control characters other than tab, line feed, form feed and carriage return never occur in a CSV. */
function isBinaryByte(byte: number): boolean {
  return byte < 0x20 && byte !== 0x09 && byte !== 0x0a && byte !== 0x0c && byte !== 0x0d;
}

function firstBinaryOffset(bytes: Uint8Array): number {
  for (let i = 0; i < bytes.length; i += 1) if (isBinaryByte(bytes[i])) return i;
  return -1;
}

/**
 * UTF-8 where the file is valid UTF-8, else Windows-1252 (what spreadsheet programs on Windows write);
 * either way a leading byte-order mark is dropped.
 */
function decode(bytes: Uint8Array): string {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    text = new TextDecoder('windows-1252').decode(bytes);
  }
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

export function csvTextOf(bytes: Uint8Array, fileName: string): string {
  const lower = fileName.toLowerCase();
  if (!TIME_STUDY_LIMITS.extensions.some((ext) => lower.endsWith(ext))) {
    throw unsupported(
      `"${fileName}" is not a CSV or text file; upload the measured cycle times as a .csv or .txt file.`,
      `must be a .csv or .txt file; got "${fileName}"`,
    );
  }
  if (bytes.length > TIME_STUDY_LIMITS.fileBytes) throw fileTooLarge(bytes.length);
  const binaryAt = firstBinaryOffset(bytes);
  if (binaryAt >= 0) {
    throw unsupported(
      `"${fileName}" is not a text file (byte ${binaryAt + 1} is a control character); export the times from the spreadsheet as CSV.`,
      `is not text: byte ${binaryAt + 1} is a control character`,
    );
  }
  return decode(bytes);
}
