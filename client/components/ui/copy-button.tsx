import { useEffect, useState } from 'react';
import { Button } from './button';
import type { ButtonVariant } from './button-styles';

type CopyState = 'idle' | 'copied' | 'failed';

/** Copies `text` to the clipboard and says so for two seconds. */
export function CopyButton({ text, label = 'Copy', variant = 'primary' }: { text: string; label?: string; variant?: ButtonVariant }) {
  const [state, setState] = useState<CopyState>('idle');

  useEffect(() => {
    if (state === 'idle') return;
    const timer = setTimeout(() => setState('idle'), 2000);
    return () => clearTimeout(timer);
  }, [state]);

  async function copy() {
    try {
      await navigator.clipboard.writeText(text);
      setState('copied');
    } catch {
      // Clipboard access needs a secure context; on plain http the person selects the text instead.
      setState('failed');
    }
  }

  return (
    <span className="inline-flex items-center gap-2">
      <Button size="sm" variant={variant} onClick={copy}>
        {label}
      </Button>
      <span aria-live="polite" className="text-sm text-asphalt-300">
        {state === 'copied' && 'Copied'}
        {state === 'failed' && 'Couldn’t copy here. Select the text and copy it by hand.'}
      </span>
    </span>
  );
}
