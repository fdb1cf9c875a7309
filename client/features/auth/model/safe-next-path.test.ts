import { describe, expect, it } from 'vitest';
import { safeNextPath, signInPathFor } from './safe-next-path';

describe('safeNextPath', () => {
  it.each([
    [null, '/'],
    ['', '/'],
    ['/settings/team', '/settings/team'],
    ['/recordings?match=Q12', '/recordings?match=Q12'],
    ['https://example.org/', '/'],
    ['//example.org', '/'],
    ['/\\example.org', '/'],
    ['/sign-in', '/'],
    ['/reset?token=abc', '/'],
    ['/signage', '/signage'],
  ])('turns %o into %s', (next, expected) => {
    expect(safeNextPath(next)).toBe(expected);
  });
});

describe('signInPathFor', () => {
  it('remembers the page to come back to', () => {
    expect(signInPathFor('/settings/team', '?tab=keys')).toBe('/sign-in?next=%2Fsettings%2Fteam%3Ftab%3Dkeys');
  });

  it('leaves out next for the team home', () => {
    expect(signInPathFor('/')).toBe('/sign-in');
  });
});
