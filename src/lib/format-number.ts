// Number and money formatting for the comparison tables and sentences of runs and of studies
// (British English separators).
export function formatNumber(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '—';
  return value.toLocaleString('en-GB', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
}

export function formatSigned(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return '—';
  const text = formatNumber(Math.abs(value), decimals);
  // A value that rounds to zero is shown without a sign: "−0.0" reads as a real loss.
  if (Number(text.replace(/,/g, '')) === 0) return text;
  return value > 0 ? `+${text}` : `−${text}`;
}

export function formatMoney(value: number, currency: string): string {
  return `${currency} ${value.toLocaleString('en-GB', { maximumFractionDigits: 0 })}`;
}
