/** Keyboard on the layout screen: arrows nudge (Shift: 1 mm), R rotates, Delete removes, Ctrl+Z / Ctrl+Shift+Z undo/redo. */
import { useEventListener } from '@vueuse/core';

/** Actions the keys trigger. */
export interface LayoutKeyActions {
  enabled: () => boolean;
  nudge: (dx: number, dy: number, large: boolean) => void;
  rotate: () => void;
  remove: () => void;
  undo: () => void;
  redo: () => void;
}

const typing = (t: EventTarget | null) => {
  const el = t as HTMLElement | null;
  return !!el && (el.tagName === 'INPUT' || el.tagName === 'TEXTAREA' || el.isContentEditable);
};
const arrows: Record<string, [number, number]> = { ArrowLeft: [-1, 0], ArrowRight: [1, 0], ArrowUp: [0, 1], ArrowDown: [0, -1] };

/** Listen on the window while the screen is mounted; keys typed into fields are left alone. */
export function useLayoutKeys(a: LayoutKeyActions): void {
  useEventListener(window, 'keydown', (e: KeyboardEvent) => {
    if (!a.enabled() || typing(e.target)) return;
    const mod = e.ctrlKey || e.metaKey;
    const key = e.key.toLowerCase();
    if (mod && key === 'z') a[e.shiftKey ? 'redo' : 'undo']();
    else if (mod && key === 'y') a.redo();
    else if (arrows[e.key]) a.nudge(arrows[e.key][0], arrows[e.key][1], e.shiftKey);
    else if (!mod && key === 'r') a.rotate();
    else if (e.key === 'Delete' || e.key === 'Backspace') a.remove();
    else return;
    e.preventDefault();
  });
}
