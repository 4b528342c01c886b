import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { api } from '../api/client';
import type { RoomSeries } from '../charts/seriesTypes';

export interface DailyExtremes {
  roomId: number;
  timeZone: string;
  days: {
    date: string;
    loggers: { id: number; label: string; min: { t: string; c: number }; max: { t: string; c: number } }[];
  }[];
}

export interface TimeRange {
  from: number;
  to: number;
}

export const roomChartKeys = {
  all: ['room-chart'] as const,
  room: (roomId: number) => [...roomChartKeys.all, roomId] as const,
  series: (roomId: number, range: TimeRange, width: number) => [...roomChartKeys.room(roomId), 'series', range.from, range.to, width] as const,
  daily: (roomId: number, range: TimeRange) => [...roomChartKeys.room(roomId), 'daily', range.from, range.to] as const,
};

const rangeQuery = (range: TimeRange) => `from=${encodeURIComponent(new Date(range.from).toISOString())}&to=${encodeURIComponent(new Date(range.to).toISOString())}`;

/** The chart's data for a range at a pixel width; the previous picture stays up while a new range loads. */
export function useRoomSeries(roomId: number, range: TimeRange, width: number) {
  return useQuery({
    queryKey: roomChartKeys.series(roomId, range, width),
    queryFn: () => api.get<RoomSeries>(`/rooms/${roomId}/series?${rangeQuery(range)}&width=${width}`),
    enabled: width > 0,
    placeholderData: keepPreviousData,
  });
}

export function useRoomDaily(roomId: number, range: TimeRange, enabled: boolean) {
  return useQuery({
    queryKey: roomChartKeys.daily(roomId, range),
    queryFn: () => api.get<DailyExtremes>(`/rooms/${roomId}/daily?${rangeQuery(range)}`),
    enabled,
  });
}
