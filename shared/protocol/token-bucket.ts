// Pure: no imports. A token bucket for frame-rate limits; time is passed in.

export interface TokenBucket {
  tokens: number;
  lastMs: number;
}

export function createBucket(capacity: number, nowMs: number): TokenBucket {
  return { tokens: capacity, lastMs: nowMs };
}

/** Refills at `ratePerS` up to `capacity`, then takes one token if there is one. */
export function takeToken(bucket: TokenBucket, nowMs: number, ratePerS: number, capacity: number): boolean {
  const elapsedS = Math.max(0, nowMs - bucket.lastMs) / 1000;
  bucket.tokens = Math.min(capacity, bucket.tokens + elapsedS * ratePerS);
  bucket.lastMs = nowMs;
  if (bucket.tokens < 1) return false;
  bucket.tokens -= 1;
  return true;
}
