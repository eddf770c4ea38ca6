// Helpers for reading rendered charts: the tooltip, legend entries, axis labels, pointer moves.
import { fireEvent, screen } from '@testing-library/react';

export const WIDTH = 800;

/** happy-dom lays nothing out, so every box sits at (0,0) and client coordinates are local ones. */
export function hoverAt(element: Element, x: number, y: number): void {
  fireEvent.mouseMove(element, { clientX: x, clientY: y });
}

export function tooltipText(): string {
  return screen.getByRole('tooltip').textContent ?? '';
}

/** Tooltip rows as label → value, read from its definition list. */
export function tooltipRows(): Record<string, string> {
  const tooltip = screen.getByRole('tooltip');
  const labels = Array.from(tooltip.querySelectorAll('dt')).map((dt) => dt.textContent ?? '');
  const values = Array.from(tooltip.querySelectorAll('dd')).map((dd) => dd.textContent ?? '');
  return Object.fromEntries(labels.map((label, i) => [label, values[i]]));
}

export function legendLabels(container: Element): string[] {
  return Array.from(container.querySelectorAll('[data-chart-part="legend"] [data-legend-item]')).map(
    (item) => item.getAttribute('data-legend-item') ?? '',
  );
}

export function axisLabel(container: Element, axis: 'x' | 'y'): string[] {
  return Array.from(container.querySelectorAll(`[data-axis-label="${axis}"]`)).map((label) => label.textContent ?? '');
}

export function attr(element: Element, name: string): number {
  return Number(element.getAttribute(name));
}
