import type { ComponentType } from 'react';
import { LoggerIcon, RoomIcon, SettingsIcon } from './icons';

/** Only sections that exist are listed: a link to a page that does not work yet is worse than no link. */
export const NAV_ITEMS: { to: string; label: string; Icon: ComponentType }[] = [
  { to: '/rooms', label: 'Rooms', Icon: RoomIcon },
  { to: '/loggers', label: 'Loggers', Icon: LoggerIcon },
  { to: '/settings', label: 'Settings', Icon: SettingsIcon },
];
