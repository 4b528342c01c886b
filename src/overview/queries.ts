import { useQuery } from '@tanstack/react-query';
import type { AttentionLevel, Concern } from '../../shared/overview/roomAttention';
import type { RoomKind } from '../../shared/schemas/rooms';
import type { PackedLine } from '../../shared/series/packedLine';
import { api } from '../api/client';

export interface OverviewLogger {
  id: number;
  label: string;
  latest: { t: string; c: number; rh: number | null } | null;
  intervalMinutes: number | null;
  staleAfterMinutes: number;
}

interface Extreme {
  t: string;
  c: number;
  logger: string;
}

export interface OverviewBatch {
  id: number;
  code: string;
  speciesName: string;
  scionCultivar: string;
  count: number;
  since: string | null;
  worst: { minC: number | null; maxC: number | null; freezeHours: number; belowHours: number; aboveHours: number; hoursMissing: number } | null;
  callusPct: number | null;
  fullCallusAt: string | null;
}

export interface OverviewRoom {
  id: number;
  name: string;
  kind: RoomKind;
  attention: AttentionLevel;
  concerns: Concern[];
  loggers: OverviewLogger[];
  last24h: { low: Extreme | null; high: Extreme | null };
  sparkline: { id: number; label: string; temperature: PackedLine }[];
  batches: OverviewBatch[];
}

export interface Overview {
  asOf: string;
  sparkline: { from: string; to: string };
  rooms: OverviewRoom[];
}

export const overviewKeys = { all: ['overview'] as const };

/** Refreshed every minute while open: the page is what staff keep up on a phone in the garage. */
export const useOverview = () => useQuery({ queryKey: overviewKeys.all, queryFn: () => api.get<Overview>('/overview'), refetchInterval: 60_000 });
