import { useCallback, useEffect, useState } from 'react';

const RUN_VIEWPORT = 'width=device-width, initial-scale=1, maximum-scale=1, user-scalable=no, viewport-fit=cover';

/**
 * While run mode is mounted: no page zoom (viewport meta), no scrolling, rubber-banding, text selection or
 * long-press callouts. Everything is put back on unmount, so the rest of the app behaves as before.
 */
export function useRunPageLock(): void {
  useEffect(() => {
    const meta = document.querySelector<HTMLMetaElement>('meta[name="viewport"]');
    const previousViewport = meta?.content;
    if (meta) meta.content = RUN_VIEWPORT;
    const html = document.documentElement;
    const body = document.body;
    const saved = { html: html.style.cssText, body: body.style.cssText };
    for (const el of [html, body]) {
      el.style.overflow = 'hidden';
      el.style.overscrollBehavior = 'none';
      el.style.touchAction = 'none';
      el.style.userSelect = 'none';
      el.style.setProperty('-webkit-user-select', 'none');
      el.style.setProperty('-webkit-touch-callout', 'none');
      el.style.setProperty('-webkit-tap-highlight-color', 'transparent');
    }
    body.style.height = '100dvh';
    return () => {
      if (meta && previousViewport !== undefined) meta.content = previousViewport;
      html.style.cssText = saved.html;
      body.style.cssText = saved.body;
    };
  }, []);
}

/** Full screen: asked for on the first tap anywhere (browsers allow it only from a user gesture) and by a button. */
export function useFullscreen(): { isFullscreen: boolean; isSupported: boolean; enter: () => void; exit: () => void } {
  const [isFullscreen, setIsFullscreen] = useState(() => document.fullscreenElement !== null);
  const isSupported = document.fullscreenEnabled === true;
  const enter = useCallback(() => {
    if (!document.fullscreenEnabled || document.fullscreenElement) return;
    document.documentElement
      .requestFullscreen({ navigationUI: 'hide' })
      .then(() => (screen.orientation as ScreenOrientation & { lock?: (o: string) => Promise<void> }).lock?.('landscape'))
      .catch(() => {});
  }, []);
  const exit = useCallback(() => {
    if (document.fullscreenElement) void document.exitFullscreen().catch(() => {});
  }, []);
  useEffect(() => {
    const onChange = () => setIsFullscreen(document.fullscreenElement !== null);
    document.addEventListener('fullscreenchange', onChange);
    // Touch grants the gesture on pointer-up, a mouse on pointer-down: try on both until it works once.
    let isDone = false;
    const firstTap = () => {
      if (isDone) return;
      isDone = true;
      enter();
      document.removeEventListener('pointerup', firstTap, true);
      document.removeEventListener('pointerdown', firstTap, true);
    };
    document.addEventListener('pointerup', firstTap, true);
    document.addEventListener('pointerdown', firstTap, true);
    return () => {
      document.removeEventListener('fullscreenchange', onChange);
      document.removeEventListener('pointerup', firstTap, true);
      document.removeEventListener('pointerdown', firstTap, true);
    };
  }, [enter]);
  return { isFullscreen, isSupported, enter, exit };
}

export type WakeLockState = 'on' | 'off' | 'unsupported';

/** Keeps the screen awake (Screen Wake Lock API), asking again each time the page becomes visible. */
export function useWakeLock(): WakeLockState {
  const [state, setState] = useState<WakeLockState>(() => ('wakeLock' in navigator ? 'off' : 'unsupported'));
  useEffect(() => {
    if (!('wakeLock' in navigator)) return;
    let sentinel: WakeLockSentinel | undefined;
    let isMounted = true;
    const acquire = () => {
      if (document.visibilityState !== 'visible') return;
      navigator.wakeLock
        .request('screen')
        .then((s) => {
          if (!isMounted) return void s.release();
          sentinel = s;
          setState('on');
          s.addEventListener('release', () => isMounted && setState('off'));
        })
        .catch(() => isMounted && setState('off'));
    };
    acquire();
    document.addEventListener('visibilitychange', acquire);
    return () => {
      isMounted = false;
      document.removeEventListener('visibilitychange', acquire);
      void sentinel?.release().catch(() => {});
    };
  }, []);
  return state;
}

/** Whether a media query matches, following changes. */
export function useMediaQuery(query: string): boolean {
  const [matches, setMatches] = useState(() => window.matchMedia(query).matches);
  useEffect(() => {
    const list = window.matchMedia(query);
    const onChange = () => setMatches(list.matches);
    onChange();
    list.addEventListener('change', onChange);
    return () => list.removeEventListener('change', onChange);
  }, [query]);
  return matches;
}

/** Our clock, re-read every `intervalMs`, for freshness checks. */
export function useNowMs(intervalMs = 250): number {
  const [nowMs, setNowMs] = useState(() => performance.timeOrigin + performance.now());
  useEffect(() => {
    const id = window.setInterval(() => setNowMs(performance.timeOrigin + performance.now()), intervalMs);
    return () => window.clearInterval(id);
  }, [intervalMs]);
  return nowMs;
}

export type OfflineState = 'unsupported' | 'preparing' | 'ready';

/** Same-origin assets this page has fetched so far (JS chunks, CSS, fonts), for the service worker to keep. */
function loadedAssetUrls(): string[] {
  return performance
    .getEntriesByType('resource')
    .map((e) => e.name)
    .filter((name) => name.startsWith(`${location.origin}/assets/`));
}

/**
 * Registers run mode's service worker (client/public/run-sw.js) for the /run address once `isReady` (the
 * panel is loaded), then asks it to keep what this page already fetched plus the API answers run mode needs.
 */
export function useRunServiceWorker(isReady: boolean): OfflineState {
  const [state, setState] = useState<OfflineState>(() => ('serviceWorker' in navigator ? 'preparing' : 'unsupported'));
  useEffect(() => {
    if (!isReady || !('serviceWorker' in navigator)) return;
    let isMounted = true;
    const onMessage = (event: MessageEvent) => {
      if (event.data?.type === 'pitwall-run-warmed' && isMounted) setState('ready');
    };
    navigator.serviceWorker.addEventListener('message', onMessage);
    navigator.serviceWorker
      .register('/run-sw.js', { scope: '/run' })
      .then(() => navigator.serviceWorker.ready)
      .then((registration) => {
        registration.active?.postMessage({ type: 'pitwall-run-warm', urls: [...loadedAssetUrls(), '/api/panels/published', '/api/season'] });
      })
      .catch(() => isMounted && setState('unsupported'));
    return () => {
      isMounted = false;
      navigator.serviceWorker.removeEventListener('message', onMessage);
    };
  }, [isReady]);
  return state;
}
