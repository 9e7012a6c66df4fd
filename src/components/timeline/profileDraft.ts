/**
 * The profile editor's working copy: segments with times in ms and fields that may be empty while
 * typing; checked before anything reaches the model (model.ts segmentSchema: times in s).
 */
import type { Segment } from '@shared/schemas/model';
import { MAX_PROFILE_STEPS } from '@shared/engine/transient/schedule';

/** One segment as typed: powers in W, times in ms; null = empty field. */
export type SegmentDraft =
  | { kind: 'steady'; power: number | null; duration: number | null }
  | { kind: 'pulses'; onPower: number | null; offPower: number | null; onTime: number | null; offTime: number | null; repeats: number | null };

/** A problem with one field of one segment, in words a user understands. */
export interface DraftIssue {
  partId: string;
  index: number;
  field: string;
  message: string;
}

/** Limits from the model schema (segmentSchema, profile parts). */
export const DRAFT_LIMITS = { power: 5000, timeMs: 1e8, repeats: 100000, segments: 1000 } as const;

/** Model segments → draft (s → ms). */
export function toDraft(segments: readonly Segment[] | undefined): SegmentDraft[] {
  return (segments ?? []).map((s) =>
    s.kind === 'steady'
      ? { kind: 'steady', power: s.power, duration: s.duration * 1e3 }
      : { kind: 'pulses', onPower: s.onPower, offPower: s.offPower, onTime: s.onTime * 1e3, offTime: s.offTime * 1e3, repeats: s.repeats },
  );
}

/** Draft → model segments (ms → s); call only when validateDraft found nothing. */
export function fromDraft(drafts: readonly SegmentDraft[]): Segment[] {
  return drafts.map((d) =>
    d.kind === 'steady'
      ? { kind: 'steady', power: d.power!, duration: d.duration! / 1e3 }
      : { kind: 'pulses', onPower: d.onPower!, offPower: d.offPower!, onTime: d.onTime! / 1e3, offTime: d.offTime! / 1e3, repeats: d.repeats! },
  );
}

function checkPower(v: number | null, label: string): string | null {
  if (v === null || !Number.isFinite(v)) return `Enter the ${label} in W.`;
  if (v < 0) return `The ${label} cannot be negative (${v} W): use 0 W for off.`;
  if (v > DRAFT_LIMITS.power) return `The ${label} is above ${DRAFT_LIMITS.power} W.`;
  return null;
}

function checkTime(v: number | null, label: string): string | null {
  if (v === null || !Number.isFinite(v)) return `Enter the ${label} in ms.`;
  if (v <= 0) return `The ${label} must be longer than 0 ms (got ${v} ms).`;
  if (v > DRAFT_LIMITS.timeMs) return `The ${label} is above ${DRAFT_LIMITS.timeMs / 1e3} s.`;
  return null;
}

/** Every problem of the drafts of all parts; empty when they can be saved. */
export function validateDraft(parts: Record<string, readonly SegmentDraft[]>): DraftIssue[] {
  const issues: DraftIssue[] = [];
  let steps = 0;
  for (const [partId, drafts] of Object.entries(parts)) {
    const add = (index: number, field: string, message: string | null) => message && issues.push({ partId, index, field, message });
    if (drafts.length > DRAFT_LIMITS.segments) add(0, 'segments', `A part's profile holds at most ${DRAFT_LIMITS.segments} segments.`);
    drafts.forEach((d, i) => {
      if (d.kind === 'steady') {
        add(i, 'power', checkPower(d.power, 'power'));
        add(i, 'duration', checkTime(d.duration, 'duration'));
        steps += 1;
        return;
      }
      add(i, 'onPower', checkPower(d.onPower, 'on power'));
      add(i, 'offPower', checkPower(d.offPower, 'off power'));
      add(i, 'onTime', checkTime(d.onTime, 'on time'));
      add(i, 'offTime', checkTime(d.offTime, 'off time'));
      const r = d.repeats;
      if (r === null || !Number.isInteger(r) || r < 1 || r > DRAFT_LIMITS.repeats) add(i, 'repeats', `Repeats must be a whole number from 1 to ${DRAFT_LIMITS.repeats}.`);
      else steps += 2 * r;
    });
  }
  if (steps > MAX_PROFILE_STEPS) issues.push({ partId: '', index: 0, field: 'steps', message: `The profile has ${steps} steps, above the cap of ${MAX_PROFILE_STEPS}: use fewer repeats.` });
  return issues;
}

/** Length of one part's drafts in s (0 when a field is empty). */
export function draftLength(drafts: readonly SegmentDraft[]): number {
  return drafts.reduce((t, d) => t + (d.kind === 'steady' ? (d.duration ?? 0) : ((d.onTime ?? 0) + (d.offTime ?? 0)) * (d.repeats ?? 0)), 0) / 1e3;
}
