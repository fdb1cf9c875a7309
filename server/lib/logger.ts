import { pino } from 'pino';
import pretty from 'pino-pretty';

export type Logger = pino.Logger;

/** JSON lines for machines; `human: true` prints short coloured lines for the start and dev commands. */
export function createLogger(level: string = process.env.LOG_LEVEL ?? 'info', options: { human?: boolean } = {}): Logger {
  const base = { level, base: undefined, timestamp: pino.stdTimeFunctions.isoTime };
  if (!options.human) return pino(base);
  return pino(base, pretty({ sync: true, translateTime: 'HH:MM:ss', ignore: 'pid,hostname', colorize: process.stdout.isTTY }));
}
