import { useCallback, useState } from 'react';
import { formatRunSettings, parseRunSettings, RUN_SETTINGS_KEY, type RunSettings } from '../model/run-settings';

function read(): RunSettings {
  try {
    return parseRunSettings(window.localStorage.getItem(RUN_SETTINGS_KEY));
  } catch {
    return parseRunSettings(null);
  }
}

/** Alliance, driver station and vibration, remembered on this tablet. */
export function useRunSettings(): [RunSettings, (change: Partial<RunSettings>) => void] {
  const [settings, setSettings] = useState(read);
  const update = useCallback((change: Partial<RunSettings>) => {
    setSettings((current) => {
      const next = { ...current, ...change };
      try {
        window.localStorage.setItem(RUN_SETTINGS_KEY, formatRunSettings(next));
      } catch {
        // Private mode or a full store: the choice still holds for this visit.
      }
      return next;
    });
  }, []);
  return [settings, update];
}
