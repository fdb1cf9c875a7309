import { useCallback, useEffect, useState } from 'react';

const STORAGE_KEY = 'pitwall.drills.speak';

const synth = (): SpeechSynthesis | undefined => (typeof window !== 'undefined' && 'speechSynthesis' in window ? window.speechSynthesis : undefined);

/** Speaking calls aloud with the Web Speech API, remembered per device; `isSupported` is false without it. */
export function useSpeech(): { isSupported: boolean; isOn: boolean; setOn: (on: boolean) => void; speak: (text: string) => void } {
  const isSupported = synth() !== undefined && typeof SpeechSynthesisUtterance !== 'undefined';
  const [isOn, setIsOn] = useState(() => isSupported && localStorage.getItem(STORAGE_KEY) === 'on');
  const setOn = useCallback((on: boolean) => {
    setIsOn(on);
    localStorage.setItem(STORAGE_KEY, on ? 'on' : 'off');
    if (!on) synth()?.cancel();
  }, []);
  const speak = useCallback(
    (text: string) => {
      const s = synth();
      if (!isOn || !s) return;
      s.cancel();
      const utterance = new SpeechSynthesisUtterance(text);
      utterance.rate = 1.15;
      s.speak(utterance);
    },
    [isOn],
  );
  useEffect(() => () => synth()?.cancel(), []);
  return { isSupported, isOn, setOn, speak };
}
