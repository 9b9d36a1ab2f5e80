/** Farthing's own mark: a plain copper coin with a struck rim, beside the name. */
export function Wordmark({ className = '' }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 text-lg font-semibold tracking-tight text-ink ${className}`}>
      <svg aria-hidden="true" viewBox="0 0 32 32" className="size-6 shrink-0">
        <circle cx="16" cy="16" r="15" fill="#B5652B" />
        <circle cx="16" cy="16" r="11.5" fill="none" stroke="#F7F4EE" strokeOpacity="0.7" strokeWidth="1.5" />
        <circle cx="16" cy="16" r="4" fill="#8E4B1C" />
      </svg>
      <span>Farthing</span>
    </span>
  );
}
