import { useId, useRef, useState } from 'react';
import { Button } from '../../../components/ui/button';
import type { NewApiToken } from '../api';

/**
 * Shows a freshly made token's secret, once. Copy uses the clipboard where the browser
 * allows it and otherwise selects the text, so it can be copied by hand.
 */
export function NewTokenNotice({ token, onDismiss }: { token: NewApiToken; onDismiss: () => void }) {
  const inputRef = useRef<HTMLInputElement>(null);
  const inputId = useId();
  const [copyState, setCopyState] = useState<'idle' | 'copied' | 'manual'>('idle');

  async function copy() {
    try {
      await navigator.clipboard.writeText(token.token);
      setCopyState('copied');
    } catch {
      inputRef.current?.select();
      setCopyState('manual');
    }
  }

  return (
    <section
      aria-labelledby={`${inputId}-title`}
      className="flex flex-col gap-3 rounded-lg border border-copper/40 bg-surface p-4"
    >
      <h2 id={`${inputId}-title`} className="text-base font-semibold">
        Token “{token.name}” created
      </h2>
      <p className="text-sm text-ink">
        Copy it now: this token will not be shown again. Scripts send it as{' '}
        <code className="rounded bg-paper px-1 font-mono text-xs">Authorization: Bearer &lt;token&gt;</code>.
      </p>
      <div className="flex flex-wrap items-end gap-2">
        <div className="flex min-w-72 flex-1 flex-col gap-1">
          <label htmlFor={inputId} className="text-sm font-medium">
            New API token
          </label>
          <input
            id={inputId}
            ref={inputRef}
            readOnly
            value={token.token}
            onFocus={(event) => event.currentTarget.select()}
            className="h-9 rounded-md border border-rule bg-paper px-3 font-mono text-sm"
          />
        </div>
        <Button variant="secondary" onClick={copy}>
          Copy token
        </Button>
        <Button variant="quiet" onClick={onDismiss}>
          Done
        </Button>
      </div>
      <p role="status" className="min-h-4 text-xs text-muted">
        {copyState === 'copied' ? 'Copied to the clipboard.' : copyState === 'manual' ? 'Selected: press Ctrl+C (⌘C on a Mac) to copy.' : ''}
      </p>
    </section>
  );
}
