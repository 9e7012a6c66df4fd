/** Session expiry updates are throttled: at most one store touch per session per TOUCH_INTERVAL_MS. */
import type session from 'express-session';
import { describe, expect, it } from 'vitest';
import { throttleTouches, TOUCH_INTERVAL_MS } from '../../../server/lib/sessionStore';

describe('throttleTouches', () => {
  it('passes the first touch of a session through, answers later ones at once until the interval has passed', () => {
    const calls: string[] = [];
    const store = { touch: (sid: string, _s: unknown, done?: () => void) => { calls.push(sid); done?.(); } } as unknown as session.Store;
    let now = 1_000_000;
    throttleTouches(store, () => now);
    let answered = 0;
    const touch = (sid: string) => store.touch!(sid, {} as session.SessionData, () => answered++);
    touch('a');
    touch('a');
    touch('b');
    now += TOUCH_INTERVAL_MS - 1;
    touch('a');
    now += 1;
    touch('a');
    expect(calls).toEqual(['a', 'b', 'a']);
    expect(answered).toBe(5);
  });
});
