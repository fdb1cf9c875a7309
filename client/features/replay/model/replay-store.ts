import { advanceCursor, clampTime, followWindow, type TimeWindow } from '../../../../shared/domain/timeline';

export type ReplayState = {
  tS: number;
  isPlaying: boolean;
  speed: number;
  /** The span the traces show; it pages along when the cursor leaves it. */
  window: TimeWindow;
};

type Listener = () => void;

/**
 * The one timeline cursor, outside React: playback ticks it once per animation frame and only the few small
 * parts that show the cursor subscribe, so the page itself does not re-render per frame.
 */
export function createReplayStore(durationS: number, startS: number) {
  let state: ReplayState = { tS: clampTime(startS, durationS), isPlaying: false, speed: 1, window: { fromS: 0, toS: Math.max(durationS, 0.02) } };
  const listeners = new Set<Listener>();
  let frame = 0;
  let lastFrameMs = 0;

  const set = (patch: Partial<ReplayState>) => {
    const next = { ...state, ...patch };
    if (patch.tS !== undefined && patch.window === undefined) next.window = followWindow(next.window, next.tS, durationS);
    state = next;
    listeners.forEach((l) => l());
  };

  const tick = (nowMs: number) => {
    const advanced = advanceCursor(state.tS, nowMs - lastFrameMs, state.speed, durationS);
    lastFrameMs = nowMs;
    set({ tS: advanced.tS, ...(advanced.hasEnded ? { isPlaying: false } : {}) });
    frame = advanced.hasEnded ? 0 : requestAnimationFrame(tick);
  };

  const stopLoop = () => {
    if (frame) cancelAnimationFrame(frame);
    frame = 0;
  };

  return {
    durationS,
    get: () => state,
    subscribe(listener: Listener) {
      listeners.add(listener);
      return () => {
        listeners.delete(listener);
      };
    },
    seek(tS: number) {
      set({ tS: clampTime(tS, durationS) });
    },
    play() {
      if (state.isPlaying) return;
      // Playing from the very end starts over.
      set({ isPlaying: true, ...(state.tS >= durationS ? { tS: 0 } : {}) });
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
      const fromS = clampTime(Math.min(window.fromS, window.toS), durationS);
      const toS = clampTime(Math.max(window.fromS, window.toS), durationS);
      if (toS - fromS < 0.2) return;
      if (fromS === state.window.fromS && toS === state.window.toS) return;
      set({ window: { fromS, toS } });
    },
    dispose: stopLoop,
  };
}
export type ReplayStore = ReturnType<typeof createReplayStore>;
