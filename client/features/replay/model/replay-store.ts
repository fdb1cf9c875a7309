import { advanceCursor, clampTime, followWindow, liveWindow, type TimeWindow } from '../../../../shared/domain/timeline';

export type ReplayState = {
  tS: number;
  isPlaying: boolean;
  speed: number;
  /** The span the traces show; it pages along when the cursor leaves it. */
  window: TimeWindow;
  /** How long the recording is; it grows while a live recording is being made. */
  durationS: number;
  /** A live recording: the cursor and the window stay at its newest moment until someone moves them. */
  isFollowing: boolean;
};

type Listener = () => void;

/**
 * The one timeline cursor, outside React: playback ticks it once per animation frame and only the few small
 * parts that show the cursor subscribe, so the page itself does not re-render per frame.
 */
export function createReplayStore(durationS: number, startS: number, options: { isFollowing?: boolean } = {}) {
  const isFollowing = options.isFollowing ?? false;
  let state: ReplayState = {
    tS: isFollowing ? durationS : clampTime(startS, durationS),
    isPlaying: false,
    speed: 1,
    window: isFollowing ? liveWindow(durationS) : { fromS: 0, toS: Math.max(durationS, 0.02) },
    durationS,
    isFollowing,
  };
  const listeners = new Set<Listener>();
  let frame = 0;
  let lastFrameMs = 0;

  const set = (patch: Partial<ReplayState>) => {
    const next = { ...state, ...patch };
    if (patch.tS !== undefined && patch.window === undefined) next.window = followWindow(next.window, next.tS, next.durationS);
    state = next;
    listeners.forEach((l) => l());
  };

  const tick = (nowMs: number) => {
    const advanced = advanceCursor(state.tS, nowMs - lastFrameMs, state.speed, state.durationS);
    lastFrameMs = nowMs;
    set({ tS: advanced.tS, ...(advanced.hasEnded ? { isPlaying: false } : {}) });
    frame = advanced.hasEnded ? 0 : requestAnimationFrame(tick);
  };

  const stopLoop = () => {
    if (frame) cancelAnimationFrame(frame);
    frame = 0;
  };

  return {
    get durationS() {
      return state.durationS;
    },
    get: () => state,
    subscribe(listener: Listener) {
      listeners.add(listener);
      return () => {
        listeners.delete(listener);
      };
    },
    seek(tS: number) {
      set({ tS: clampTime(tS, state.durationS), isFollowing: false });
    },
    play() {
      if (state.isPlaying) return;
      // Playing from the very end starts over.
      set({ isPlaying: true, isFollowing: false, ...(state.tS >= state.durationS ? { tS: 0 } : {}) });
      lastFrameMs = performance.now();
      frame = requestAnimationFrame(tick);
    },
    pause() {
      stopLoop();
      if (state.isPlaying) set({ isPlaying: false });
    },
    toggle() {
      if (state.isPlaying) this.pause();
      else this.play();
    },
    setSpeed(speed: number) {
      set({ speed });
    },
    setWindow(window: TimeWindow) {
      const fromS = clampTime(Math.min(window.fromS, window.toS), state.durationS);
      const toS = clampTime(Math.max(window.fromS, window.toS), state.durationS);
      if (toS - fromS < 0.2) return;
      if (fromS === state.window.fromS && toS === state.window.toS) return;
      set({ window: { fromS, toS }, isFollowing: false });
    },
    /** The recording grew (live) or was finished; a followed recording keeps the cursor at its newest moment. */
    setDuration(durationS: number) {
      if (durationS === state.durationS) return;
      if (state.isFollowing) set({ durationS, tS: durationS, window: liveWindow(durationS) });
      else set({ durationS });
    },
    /** Back to the newest moment of a live recording, and staying there as it grows. */
    follow() {
      this.pause();
      set({ isFollowing: true, tS: state.durationS, window: liveWindow(state.durationS) });
    },
    /** The recording is finished: nothing more to follow. */
    stopFollowing() {
      if (state.isFollowing) set({ isFollowing: false });
    },
    dispose: stopLoop,
  };
}
export type ReplayStore = ReturnType<typeof createReplayStore>;
