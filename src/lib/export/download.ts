// Hands a file to the browser's download machinery.

/** Keeps letters, digits, dot, dash and underscore, so the name is valid on every desktop system. */
export function safeFilename(name: string, extension: string): string {
  const base = name.replace(new RegExp(`\\.${extension}$`, 'i'), '').trim();
  const cleaned = base.replace(/[^\p{L}\p{N}._-]+/gu, '-').replace(/^-+|-+$/g, '');
  return `${cleaned || 'lanewright-export'}.${extension}`;
}

export function downloadBlob(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = filename;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // Revoking at once can cancel the download in some browsers; a minute is plenty for it to start.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}
