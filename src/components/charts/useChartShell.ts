// Width measurement and tooltip state that every chart needs. Width follows the container through a
// ResizeObserver; where nothing has been measured yet (first render, tests) a fallback width is used.
import { useCallback, useLayoutEffect, useRef, useState, type MouseEvent } from 'react';

export const FALLBACK_CHART_WIDTH = 720;

export interface TooltipContent {
  title: string;
  rows: ReadonlyArray<readonly [label: string, value: string]>;
}

export interface TooltipState extends TooltipContent {
  /** Pointer position relative to the chart container, in px. */
  x: number;
  y: number;
}

export interface ChartShell {
  containerRef: React.RefObject<HTMLDivElement | null>;
  width: number;
  tooltip: TooltipState | null;
  showTooltip: (event: MouseEvent<Element>, content: TooltipContent) => void;
  hideTooltip: () => void;
}

export function useChartShell(fixedWidth?: number): ChartShell {
  const containerRef = useRef<HTMLDivElement | null>(null);
  const [measured, setMeasured] = useState<number | null>(null);
  const [tooltip, setTooltip] = useState<TooltipState | null>(null);

  useLayoutEffect(() => {
    const element = containerRef.current;
    if (fixedWidth !== undefined || !element || typeof ResizeObserver === 'undefined') return;
    const update = (width: number) => {
      // A zero width means "not laid out yet" (hidden tab, test DOM); keep the previous width then.
      if (width > 0) setMeasured(Math.floor(width));
    };
    update(element.clientWidth);
    const observer = new ResizeObserver((entries) => {
      for (const entry of entries) update(entry.contentRect.width);
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [fixedWidth]);

  const showTooltip = useCallback((event: MouseEvent<Element>, content: TooltipContent) => {
    const box = containerRef.current?.getBoundingClientRect();
    setTooltip({ ...content, x: event.clientX - (box?.left ?? 0), y: event.clientY - (box?.top ?? 0) });
  }, []);
  const hideTooltip = useCallback(() => setTooltip(null), []);

  return {
    containerRef,
    width: fixedWidth ?? measured ?? FALLBACK_CHART_WIDTH,
    tooltip,
    showTooltip,
    hideTooltip,
  };
}

/** Pointer position inside the element that received the event (the plot's hit area). */
export function localPoint(event: MouseEvent<Element>): { x: number; y: number } {
  const box = event.currentTarget.getBoundingClientRect();
  return { x: event.clientX - box.left, y: event.clientY - box.top };
}
