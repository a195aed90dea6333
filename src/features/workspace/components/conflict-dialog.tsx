import { useState } from 'react';
import { Button } from '../../../components/ui/button';

/** Someone saved this make after it was opened here: reload theirs, or apply this change on top. */
export function ConflictDialog({ message, onReload, onApplyOnTop }: { message: string; onReload: () => Promise<void>; onApplyOnTop: () => Promise<void> }) {
  const [busy, setBusy] = useState(false);
  const run = (f: () => Promise<void>) => {
    setBusy(true);
    void f().finally(() => setBusy(false));
  };
  return (
    <div role="alertdialog" aria-modal="true" aria-labelledby="conflict-title" aria-describedby="conflict-text" className="fixed inset-0 z-50 flex items-center justify-center bg-ink-900/40 p-4">
      <div className="max-w-md rounded-lg border border-calico-400 bg-calico-50 p-5 shadow-xl">
        <h2 id="conflict-title" className="font-display text-xl text-ink-900">
          This make changed while you worked
        </h2>
        <p id="conflict-text" className="mt-2 text-sm text-ink-700">
          {message}
        </p>
        <p className="mt-2 text-sm text-ink-700">Nothing is lost either way: every saved revision stays in the history.</p>
        <div className="mt-4 flex flex-wrap gap-2">
          <Button autoFocus disabled={busy} onClick={() => run(onApplyOnTop)}>
            Apply my change on top
          </Button>
          <Button variant="secondary" disabled={busy} onClick={() => run(onReload)}>
            Reload the newest revision
          </Button>
        </div>
      </div>
    </div>
  );
}
