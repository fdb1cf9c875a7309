import { describe, expect, it } from 'vitest';
import { readEnv } from './env';

describe('readEnv', () => {
  it('gives sensible defaults', () => {
    const env = readEnv({});
    expect(env).toMatchObject({ PORT: 5810, HOST: '127.0.0.1', PITWALL_DATA_DIR: '.data', PITWALL_SIMULATOR: true });
    expect(env.DATABASE_URL).toBeUndefined();
    expect(env.SMTP_HOST).toBeUndefined();
  });

  it('treats empty values as unset and reads flags', () => {
    expect(readEnv({ PORT: '', SMTP_SECURE: 'yes', PITWALL_SIMULATOR: '0' })).toMatchObject({ PORT: 5810, SMTP_SECURE: true, PITWALL_SIMULATOR: false });
  });

  it('names each bad variable', () => {
    expect(() => readEnv({ PORT: 'eighty', PITWALL_TOKEN_SECRET: 'short' })).toThrow(/PORT[\s\S]*PITWALL_TOKEN_SECRET/);
  });
});
