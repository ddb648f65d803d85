/**
 * "Past usual time": an authority has held something longer than its profile's usual review time.
 * An hourglass and words, never colour alone (the palette keeps green, amber and red for check results).
 */
export function PastUsualMark({ days }: { days: number }) {
  return (
    <span
      className="ml-1 inline-flex items-center gap-1 whitespace-nowrap rounded border border-ink-soft/50 px-1.5 py-0.5 text-xs"
      title={`Waiting ${days} ${days === 1 ? "day" : "days"} longer than this authority usually takes`}
      data-testid="past-usual"
    >
      <svg aria-hidden="true" viewBox="0 0 12 12" className="h-3 w-3" fill="none" stroke="currentColor" strokeWidth="1.2">
        <path d="M3 1.5h6M3 10.5h6M3.5 1.5c0 3 5 3 5 4.5s-5 1.5-5 4.5M8.5 1.5c0 3-5 3-5 4.5s5 1.5 5 4.5" />
      </svg>
      past usual +{days} d
    </span>
  );
}
