// Display formatting shared by every feature, so dates, lengths and counts
// read the same on every page.
import type { UserRef } from '../../shared/api/common';

const dateTime = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateTime.format(date);
}

const day = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium' });

/** A day as the app writes it everywhere ("2 Dec 2026"), never the browser's mm/dd/yyyy. */
export function formatDay(date: Date): string {
  return day.format(date);
}

/** Lengths are stored in millimetres; people read long track in metres. */
export function formatLengthMm(mm: number): string {
  if (Math.abs(mm) >= 1000) return `${(mm / 1000).toLocaleString('en-GB', { maximumFractionDigits: 2 })} m`;
  return `${mm.toLocaleString('en-GB', { maximumFractionDigits: 1 })} mm`;
}

export function formatCount(count: number, singular: string, plural = `${singular}s`): string {
  return `${count.toLocaleString('en-GB')} ${count === 1 ? singular : plural}`;
}

/** Accounts can be deleted while their work stays; say so rather than show a blank. */
export function formatPerson(user: UserRef | null): string {
  return user ? user.name : 'a former member';
}

/** "2 h 05 min", "4 min 10 s", "12 s": short enough for a progress line. */
export function formatDuration(seconds: number): string {
  const s = Math.max(0, Math.round(seconds));
  if (s < 60) return `${s} s`;
  if (s < 3600) return `${Math.floor(s / 60)} min ${String(s % 60).padStart(2, '0')} s`;
  return `${Math.floor(s / 3600)} h ${String(Math.floor((s % 3600) / 60)).padStart(2, '0')} min`;
}
