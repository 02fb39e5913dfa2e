// Lobewright's wordmark: two lobes of opposite phase meeting at the nucleus, beside the name.
export function Wordmark() {
  return (
    <span className="flex items-center gap-2 text-lg font-semibold tracking-tight text-stone-900">
      <svg aria-hidden="true" viewBox="0 0 24 24" className="size-7">
        <g transform="rotate(-32 12 12)">
          <path d="M12 12C7.2 8.6 8 1.6 12 1.6S16.8 8.6 12 12Z" className="fill-accent-600" />
          <path
            d="M12 12C7.2 15.4 8 22.4 12 22.4S16.8 15.4 12 12Z"
            className="fill-white stroke-accent-600"
            strokeWidth="1.4"
            strokeLinejoin="round"
          />
        </g>
      </svg>
      Lobewright
    </span>
  );
}
