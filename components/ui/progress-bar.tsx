/** The one progress bar of the app: a filled track with its percentage for assistive technology. */
export function ProgressBar({ percent, label }: { percent: number; label: string }) {
  return (
    <div
      className="h-2 flex-1 overflow-hidden rounded bg-paper-sunk"
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={percent}
    >
      <div className="h-full bg-clay-500 transition-[width]" style={{ width: `${percent}%` }} />
    </div>
  );
}
