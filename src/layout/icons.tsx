// Small line icons drawn for Coldknit; decorative, so hidden from assistive technology (the text label carries the meaning).
const common = { width: 22, height: 22, viewBox: '0 0 24 24', fill: 'none', stroke: 'currentColor', strokeWidth: 1.8, strokeLinecap: 'round', strokeLinejoin: 'round', 'aria-hidden': true } as const;

/** A storeroom: a low roof over a door. */
export function RoomIcon() {
  return (
    <svg {...common}>
      <path d="M3 10.5 12 4l9 6.5" />
      <path d="M5 9v11h14V9" />
      <path d="M10 20v-6h4v6" />
    </svg>
  );
}

/** A logger: a small box with a probe and a reading line. */
export function LoggerIcon() {
  return (
    <svg {...common}>
      <rect x="5" y="3" width="10" height="15" rx="2" />
      <path d="M8 8h4M8 11h4" />
      <path d="M15 14h3a2 2 0 0 1 2 2v5" />
    </svg>
  );
}

/** Settings: three sliders. */
export function SettingsIcon() {
  return (
    <svg {...common}>
      <path d="M4 6h9M17 6h3M4 12h3M11 12h9M4 18h11M19 18h1" />
      <circle cx="15" cy="6" r="2" />
      <circle cx="9" cy="12" r="2" />
      <circle cx="17" cy="18" r="2" />
    </svg>
  );
}
