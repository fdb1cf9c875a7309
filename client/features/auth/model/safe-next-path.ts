/**
 * Where to go after signing in. Only a path on this site is allowed, so a crafted
 * `?next=https://elsewhere` link can't bounce someone off Pitwall.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return '/';
  if (/^\/(sign-in|sign-up|forgot|reset)(\/|\?|$)/.test(next)) return '/';
  return next;
}

/** `/sign-in?next=…` for the page someone was on when their session ended. */
export function signInPathFor(pathname: string, search = ''): string {
  const here = pathname + search;
  return here === '/' || here === '' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(here)}`;
}
