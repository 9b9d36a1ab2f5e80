import { Spinner } from './spinner';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-2 px-1 py-8 text-sm text-muted">
      <Spinner />
      <span>{label}</span>
    </div>
  );
}
