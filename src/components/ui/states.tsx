import type { ReactNode } from 'react';
import { errorMessage } from '../../lib/api-client';
import { Button } from './button';
import { Notice } from './notice';

/** Shown while data loads; announced politely. */
export function LoadingState({ what = 'Loading' }: { what?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-2 py-6 text-ink-soft">
      <span className="inline-block size-3 animate-pulse rounded-full bg-gold-400" aria-hidden="true" />
      {what}…
    </div>
  );
}

/** Shown when a list has nothing in it yet, with the next step. */
export function EmptyState({ title, children, action }: { title: string; children?: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-lg border border-dashed border-line-strong bg-panel px-5 py-8 text-center">
      <p className="font-semibold">{title}</p>
      {children ? <div className="mt-1 text-ink-soft">{children}</div> : null}
      {action ? <div className="mt-3 flex justify-center">{action}</div> : null}
    </div>
  );
}

/** Shown when loading failed, with the server's message and a way to try again. */
export function ErrorState({ error, retry, title = 'This could not be loaded' }: { error: unknown; retry?: () => void; title?: string }) {
  return (
    <Notice tone="error" title={title}>
      <p>{errorMessage(error)}</p>
      {retry ? (
        <Button size="sm" className="mt-2" onClick={retry}>
          Try again
        </Button>
      ) : null}
    </Notice>
  );
}
