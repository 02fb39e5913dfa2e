// Lobewright's wordmark: two lobes meeting at a point, drawn inline, beside the name.
export function Wordmark() {
  return (
    <span className="flex items-center gap-2 text-lg font-semibold tracking-tight text-stone-900">
      <svg aria-hidden="true" viewBox="0 0 24 24" className="size-6">
        <ellipse cx="12" cy="6.5" rx="4.2" ry="5.5" className="fill-accent-600" />
        <ellipse
          cx="12"
          cy="17.5"
          rx="4.2"
          ry="5.5"
          className="fill-none stroke-accent-600"
          strokeWidth="1.6"
        />
      </svg>
      Lobewright
    </span>
  );
}
