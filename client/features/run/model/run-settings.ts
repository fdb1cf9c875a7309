// Pure: run mode's remembered settings (alliance, driver station, vibration) and their storage text.
import { z } from 'zod';
import { allianceSchema, driverStationSchema } from '../../../../shared/domain/season/season-profile';

export const RUN_SETTINGS_KEY = 'pitwall.run.settings';

export const runSettingsSchema = z.object({
  alliance: allianceSchema,
  driverStation: driverStationSchema,
  /** A short buzz on each tap, where the tablet can. */
  isVibrationOn: z.boolean(),
});
export type RunSettings = z.infer<typeof runSettingsSchema>;

export const DEFAULT_RUN_SETTINGS: RunSettings = { alliance: 'blue', driverStation: 1, isVibrationOn: true };

/** The settings stored as `text`; defaults for missing, broken or partly valid text (valid parts kept). */
export function parseRunSettings(text: string | null): RunSettings {
  if (!text) return DEFAULT_RUN_SETTINGS;
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    return DEFAULT_RUN_SETTINGS;
  }
  if (!raw || typeof raw !== 'object') return DEFAULT_RUN_SETTINGS;
  const keep: Partial<RunSettings> = {};
  for (const key of Object.keys(runSettingsSchema.shape) as (keyof RunSettings)[]) {
    const one = runSettingsSchema.shape[key].safeParse((raw as Record<string, unknown>)[key]);
    if (one.success) Object.assign(keep, { [key]: one.data });
  }
  return { ...DEFAULT_RUN_SETTINGS, ...keep };
}

/** The settings as stored text. */
export const formatRunSettings = (settings: RunSettings): string => JSON.stringify(settings);

/** "Blue 2", "Red 3". */
export const seatText = (s: Pick<RunSettings, 'alliance' | 'driverStation'>): string => `${s.alliance === 'red' ? 'Red' : 'Blue'} ${s.driverStation}`;
