import type { ComponentType } from 'react';
import { AlertIcon, BatchIcon, ImportIcon, LoggerIcon, OverviewIcon, RoomIcon, SeasonIcon, SettingsIcon } from './icons';

export interface NavItem {
  to: string;
  label: string;
  Icon: ComponentType;
  /** In the phone's bottom bar; the rest are one tap away under "More". */
  onPhoneBar?: boolean;
}

/** Only sections that exist are listed: a link to a page that does not work yet is worse than no link. */
export const NAV_ITEMS: NavItem[] = [
  { to: '/overview', label: 'Overview', Icon: OverviewIcon, onPhoneBar: true },
  { to: '/rooms', label: 'Rooms', Icon: RoomIcon, onPhoneBar: true },
  { to: '/batches', label: 'Batches', Icon: BatchIcon, onPhoneBar: true },
  { to: '/alerts', label: 'Alerts', Icon: AlertIcon, onPhoneBar: true },
  { to: '/loggers', label: 'Loggers', Icon: LoggerIcon },
  { to: '/imports', label: 'Imports', Icon: ImportIcon },
  { to: '/season', label: 'Season', Icon: SeasonIcon },
  { to: '/settings', label: 'Settings', Icon: SettingsIcon },
];
