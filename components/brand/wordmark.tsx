/** Our mark: a sun arc over a ground line, drawn here so no image file is needed. */
export function Wordmark({ compact = false }: { compact?: boolean }) {
  return (
    <span className="inline-flex items-center gap-2 font-semibold tracking-tight text-ink">
      <svg width="26" height="26" viewBox="0 0 26 26" aria-hidden>
        <path d="M4 17a9 9 0 0 1 18 0" fill="none" stroke="#b5652b" strokeWidth="2.5" strokeLinecap="round" />
        <path d="M2 21h22" stroke="#1f1c17" strokeWidth="2" strokeLinecap="round" />
        <path d="M13 4v3M6.5 7.5l2 2M19.5 7.5l-2 2" stroke="#b5652b" strokeWidth="2" strokeLinecap="round" />
      </svg>
      {compact ? null : <span className="text-xl">Ohmstead</span>}
    </span>
  );
}
