// What the user has picked in the drawing or the editor's lists; both show it highlighted.
export type LayoutSelection =
  { kind: 'lane'; index: number } | { kind: 'station'; stepIndex: number; stationIndex: number } | null;

export function isLaneSelected(selection: LayoutSelection, index: number): boolean {
  return selection?.kind === 'lane' && selection.index === index;
}

export function isStationSelected(selection: LayoutSelection, stepIndex: number, stationIndex: number): boolean {
  return selection?.kind === 'station' && selection.stepIndex === stepIndex && selection.stationIndex === stationIndex;
}
