// Which of several events due at the same instant runs first (lower first; then the order they were
// scheduled). A calendar edge (a break starting or ending) comes before the line's own events, so a
// move planned at that instant already sees the stop; the line's events come before a snapshot
// sample, so the sample shows what the instant left; the end of the run comes last of all.
export const PRIORITY = Object.freeze({
  calendar: 0,
  line: 1,
  sample: 2,
  end: 3,
});

export type Priority = (typeof PRIORITY)[keyof typeof PRIORITY];
