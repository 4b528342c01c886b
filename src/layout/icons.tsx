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

/** Overview: a thermometer beside a level line. */
export function OverviewIcon() {
  return (
    <svg {...common}>
      <path d="M9 14.5V5a2 2 0 1 1 4 0v9.5a3.5 3.5 0 1 1-4 0Z" />
      <path d="M11 9v7" />
      <path d="M16 7h4M16 11h4M16 15h2" />
    </svg>
  );
}

/** Batches: grafted sticks bound together. */
export function BatchIcon() {
  return (
    <svg {...common}>
      <path d="M7 21V5M12 21V3M17 21V6" />
      <path d="M5 13h14" />
      <path d="M7 5l-1.5-1.5M17 6l1.5-1.5" />
    </svg>
  );
}

/** Imports: a tray with an arrow coming down into it. */
export function ImportIcon() {
  return (
    <svg {...common}>
      <path d="M12 3v11M8 10l4 4 4-4" />
      <path d="M4 15v4a1 1 0 0 0 1 1h14a1 1 0 0 0 1-1v-4" />
    </svg>
  );
}

/** Alerts: a bell. */
export function AlertIcon() {
  return (
    <svg {...common}>
      <path d="M6 16V11a6 6 0 1 1 12 0v5l1.5 2h-15Z" />
      <path d="M10 20a2 2 0 0 0 4 0" />
    </svg>
  );
}

/** Season: a young tree that took. */
export function SeasonIcon() {
  return (
    <svg {...common}>
      <path d="M12 21v-9" />
      <path d="M12 12c-4 0-6-2.5-6-6 3.5 0 6 2 6 6Z" />
      <path d="M12 14c3.5 0 6-2 6-5.5-3.5 0-6 2-6 5.5Z" />
      <path d="M7 21h10" />
    </svg>
  );
}

/** More: three dots. */
export function MoreIcon() {
  return (
    <svg {...common}>
      <circle cx="5" cy="12" r="1.5" />
      <circle cx="12" cy="12" r="1.5" />
      <circle cx="19" cy="12" r="1.5" />
    </svg>
  );
}
