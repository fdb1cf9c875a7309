import { describe, expect, it } from 'vitest';
import { createReplayStore } from './replay-store';

describe('the replay store of a live recording', () => {
  it('keeps the cursor and the last 30 s at the newest moment while following, and stops following on a seek', () => {
    const store = createReplayStore(40, 0, { isFollowing: true });
    expect(store.get()).toMatchObject({ tS: 40, isFollowing: true, window: { fromS: 10, toS: 40 } });
    store.setDuration(41.5);
    expect(store.get()).toMatchObject({ tS: 41.5, durationS: 41.5, window: { fromS: 11.5, toS: 41.5 } });
    store.seek(20);
    expect(store.get()).toMatchObject({ tS: 20, isFollowing: false });
    store.setDuration(43);
    expect(store.get()).toMatchObject({ tS: 20, durationS: 43, isFollowing: false });
    expect(store.durationS).toBe(43);
    store.follow();
    expect(store.get()).toMatchObject({ tS: 43, isFollowing: true, window: { fromS: 13, toS: 43 } });
  });

  it('stops following when the window is moved, and when the recording is finished', () => {
    const store = createReplayStore(60, 0, { isFollowing: true });
    store.setWindow({ fromS: 5, toS: 25 });
    expect(store.get()).toMatchObject({ isFollowing: false, window: { fromS: 5, toS: 25 } });
    store.follow();
    store.stopFollowing();
    store.setDuration(75);
    expect(store.get()).toMatchObject({ tS: 60, durationS: 75, isFollowing: false });
  });

  it('opens a finished recording at the given moment, not following', () => {
    const store = createReplayStore(150, 93.2);
    expect(store.get()).toMatchObject({ tS: 93.2, isFollowing: false, window: { fromS: 0, toS: 150 } });
  });
});
