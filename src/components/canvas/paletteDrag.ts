/** Dragging a template from the palette onto the canvas with pointer events: a snapped ghost follows, release places it. */
import { ref } from 'vue';
import { useEventListener } from '@vueuse/core';
import type { PaletteEntry } from '@/stores/library';
import { snapTo, type Position } from './edits';

/** Footprint shown while a template is dragged over the canvas (m). */
export interface Ghost { x: number; y: number; width: number; height: number; rotation: number }

/** What the palette drag needs from the screen. */
export interface PaletteDragHooks {
  entry: (key: string) => PaletteEntry | undefined;
  modelAt: (clientX: number, clientY: number) => Position | null;
  snap: () => number;
  place: (key: string, at: Position) => void;
}

/** Start with `grab(key)` on pointerdown in the palette; window listeners track the pointer until release or Escape. */
export function usePaletteDrag(h: PaletteDragHooks) {
  const grabbed = ref<string | null>(null);
  const ghost = ref<Ghost | null>(null);

  const at = (e: PointerEvent) => {
    const p = h.modelAt(e.clientX, e.clientY);
    return p ? { x: snapTo(p.x, h.snap()), y: snapTo(p.y, h.snap()) } : null;
  };
  useEventListener(window, 'pointermove', (e: PointerEvent) => {
    const body = grabbed.value ? h.entry(grabbed.value)?.part : undefined;
    const p = body ? at(e) : null;
    ghost.value = body && p ? { ...p, width: body.width, height: body.height, rotation: body.rotation ?? 0 } : null;
  });
  useEventListener(window, 'pointerup', (e: PointerEvent) => {
    const key = grabbed.value;
    grabbed.value = null;
    ghost.value = null;
    const p = key ? at(e) : null;
    if (key && p) h.place(key, p);
  });
  useEventListener(window, 'keydown', (e: KeyboardEvent) => {
    if (e.key === 'Escape') { grabbed.value = null; ghost.value = null; }
  });

  return { ghost, grabbed, grab: (key: string) => { grabbed.value = key; } };
}
