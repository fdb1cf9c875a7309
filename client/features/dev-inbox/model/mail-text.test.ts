import { describe, expect, it } from 'vitest';
import { localPath, splitMailText } from './mail-text';

describe('splitMailText', () => {
  it('returns the text whole when it has no links', () => {
    expect(splitMailText('Hello', [])).toEqual([{ kind: 'text', text: 'Hello' }]);
  });

  it('cuts links out of the text in order', () => {
    const text = 'Join here: http://127.0.0.1:5810/invite/abc\nor ignore it.';
    expect(splitMailText(text, ['http://127.0.0.1:5810/invite/abc'])).toEqual([
      { kind: 'text', text: 'Join here: ' },
      { kind: 'link', href: 'http://127.0.0.1:5810/invite/abc' },
      { kind: 'text', text: '\nor ignore it.' },
    ]);
  });

  it('prefers the longer link when one is the start of another', () => {
    const text = 'a http://x/reset?token=1 b';
    expect(splitMailText(text, ['http://x/reset', 'http://x/reset?token=1'])[1]).toEqual({
      kind: 'link',
      href: 'http://x/reset?token=1',
    });
  });

  it('finds a link that appears twice', () => {
    const segments = splitMailText('http://x/a and http://x/a', ['http://x/a']);
    expect(segments.filter((s) => s.kind === 'link')).toHaveLength(2);
  });
});

describe('localPath', () => {
  it('keeps path and query of a same-origin link', () => {
    expect(localPath('http://127.0.0.1:5810/reset?token=abc', 'http://127.0.0.1:5810')).toBe('/reset?token=abc');
  });

  it('returns null for another origin', () => {
    expect(localPath('https://example.org/x', 'http://127.0.0.1:5810')).toBeNull();
  });
});
