import { useEffect, useRef, type RefObject } from 'react';

const inFormControl = (target: EventTarget | null) =>
  target instanceof HTMLElement && !!target.closest('input, select, textarea, [contenteditable]');

interface MapKeys {
  /** Arrow keys count only while focus is on the page itself or inside this element. */
  region: RefObject<HTMLElement | null>;
  onStep: (direction: 1 | -1) => void;
  onZoom: (direction: 1 | -1) => void;
  onEscape: () => void;
}

/**
 * The map's keys: arrows step from tree to tree, + and − zoom, Esc closes. Typing in a field is
 * left alone, except Esc.
 */
export function useMapKeys(keys: MapKeys) {
  const latest = useRef(keys);
  useEffect(() => {
    latest.current = keys;
  });

  useEffect(() => {
    const onKey = (event: KeyboardEvent) => {
      const { region, onStep, onZoom, onEscape } = latest.current;
      if (event.key === 'Escape') return onEscape();
      const inMap =
        event.target === document.body ||
        (event.target instanceof Node && !!region.current?.contains(event.target));
      if (!inMap || inFormControl(event.target) || event.altKey || event.ctrlKey || event.metaKey)
        return;
      if (event.key === 'ArrowRight' || event.key === 'ArrowDown') onStep(1);
      else if (event.key === 'ArrowLeft' || event.key === 'ArrowUp') onStep(-1);
      else if (event.key === '+' || event.key === '=') onZoom(1);
      else if (event.key === '-') onZoom(-1);
      else return;
      event.preventDefault();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, []);
}
