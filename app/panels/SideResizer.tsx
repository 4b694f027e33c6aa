/**
 * The side panel's width, set by dragging its left edge (or with the arrow keys on it) and
 * remembered in this browser: at 1440 px the voltage ladder and the crossings table want more
 * than the default column.
 */
import { useCallback, useEffect, useState, type KeyboardEvent, type PointerEvent } from 'react';

const KEY = 'railcross.sidePanelWidth';
export const SIDE_DEFAULT = 372;
const SIDE_MIN = 300;
/** The palette's column and the least canvas left beside a wide panel. */
const PALETTE = 236;
const CANVAS_MIN = 360;

function clampWidth(w: number): number {
  const max = Math.max(SIDE_MIN, window.innerWidth - PALETTE - CANVAS_MIN);
  return Math.round(Math.min(max, Math.max(SIDE_MIN, w)));
}

function stored(): number {
  try {
    const v = Number(window.localStorage.getItem(KEY));
    return Number.isFinite(v) && v > 0 ? clampWidth(v) : SIDE_DEFAULT;
  } catch {
    return SIDE_DEFAULT;
  }
}

/** The panel's width and the handle that changes it. */
export function useSideWidth(): [number, (w: number) => void] {
  const [width, setWidth] = useState(stored);
  const set = useCallback((w: number) => {
    const next = clampWidth(w);
    setWidth(next);
    try {
      window.localStorage.setItem(KEY, String(next));
    } catch {
      // storage refused (private mode): the width still holds for this page
    }
  }, []);
  // A narrower window may leave a remembered width too wide.
  useEffect(() => {
    const onResize = () => setWidth((w) => clampWidth(w));
    window.addEventListener('resize', onResize);
    return () => window.removeEventListener('resize', onResize);
  }, []);
  return [width, set];
}

export function SideResizer({ width, onWidth }: { width: number; onWidth: (w: number) => void }) {
  const onPointerDown = (e: PointerEvent<HTMLDivElement>) => {
    e.preventDefault();
    const el = e.currentTarget;
    el.setPointerCapture(e.pointerId);
    const move = (ev: globalThis.PointerEvent) => onWidth(window.innerWidth - ev.clientX);
    const up = () => {
      el.removeEventListener('pointermove', move);
      el.removeEventListener('pointerup', up);
    };
    el.addEventListener('pointermove', move);
    el.addEventListener('pointerup', up);
  };
  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    if (e.key === 'ArrowLeft') onWidth(width + 20);
    else if (e.key === 'ArrowRight') onWidth(width - 20);
    else return;
    e.preventDefault();
  };
  return (
    // biome-ignore lint/a11y/useSemanticElements: a focusable splitter moved by arrow keys (WAI-ARIA window splitter); an <hr> takes no focus
    <div
      className="rc-side-resizer"
      role="separator"
      aria-orientation="vertical"
      aria-label="Side panel width (drag, or arrow keys)"
      aria-valuenow={width}
      tabIndex={0}
      data-testid="side-resizer"
      onPointerDown={onPointerDown}
      onKeyDown={onKeyDown}
      onDoubleClick={() => onWidth(SIDE_DEFAULT)}
      title="Drag to widen the panel; double-click for the default width"
    />
  );
}
