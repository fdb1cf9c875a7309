import { useCallback, useEffect, useState } from 'react';

/** The Fullscreen API for the whole page, guarded for browsers (and iframes) without it. */
export function useFullScreen(): { isSupported: boolean; isOn: boolean; toggle: () => void } {
  const isSupported = typeof document !== 'undefined' && document.fullscreenEnabled === true;
  const [isOn, setIsOn] = useState(() => typeof document !== 'undefined' && document.fullscreenElement !== null);
  useEffect(() => {
    const onChange = () => setIsOn(document.fullscreenElement !== null);
    document.addEventListener('fullscreenchange', onChange);
    return () => document.removeEventListener('fullscreenchange', onChange);
  }, []);
  const toggle = useCallback(() => {
    if (document.fullscreenElement) void document.exitFullscreen().catch(() => {});
    else void document.documentElement.requestFullscreen().catch(() => {});
  }, []);
  return { isSupported, isOn, toggle };
}
