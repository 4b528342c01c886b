import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { AlertRule, Severity, SubjectKind } from '../../shared/alerts/rules';
import type { FindingDetail } from '../../shared/alerts/types';
import type { AlertListQuery, AlertStatus, AlertThresholds, RoomThresholds, SubscriptionLevel, SubscriptionTopic, ThresholdsPatch } from '../../shared/schemas/alerts';
import { api } from '../api/client';

export interface AlertItem {
  id: number;
  rule: AlertRule;
  severity: Severity;
  status: AlertStatus;
  subjectKind: SubjectKind;
  subjectId: number;
  subjectName: string;
  roomId: number | null;
  /** Epoch ms, as the server sends them. */
  since: number | null;
  openedAt: number;
  acknowledgedAt: number | null;
  acknowledgedByName: string | null;
  resolvedAt: number | null;
  resolution: 'cleared' | 'unwatched' | null;
  remindersSent: number;
  detail: FindingDetail;
}

export interface AlertList {
  alerts: AlertItem[];
  nextBefore: number | null;
}

export interface AlertSettings {
  defaults: AlertThresholds;
  nursery: Partial<AlertThresholds>;
  effective: AlertThresholds;
  rooms: { roomId: number; thresholds: Partial<RoomThresholds> }[];
}

export interface Subscriptions {
  levels: Record<SubscriptionTopic, SubscriptionLevel>;
  defaults: Record<SubscriptionTopic, SubscriptionLevel>;
}

export const alertKeys = {
  all: ['alerts'] as const,
  list: (query: AlertListQuery) => [...alertKeys.all, 'list', query] as const,
  detail: (id: number) => [...alertKeys.all, 'detail', id] as const,
  summary: () => [...alertKeys.all, 'summary'] as const,
  settings: ['alert-settings'] as const,
  subscriptions: ['alert-subscriptions'] as const,
};

function queryString(query: AlertListQuery): string {
  const pairs = Object.entries(query).filter(([, v]) => v !== undefined && v !== '') as [string, string][];
  return pairs.length ? `?${new URLSearchParams(pairs.map(([k, v]) => [k, String(v)]))}` : '';
}

export const useAlerts = (query: AlertListQuery) =>
  useQuery({ queryKey: alertKeys.list(query), queryFn: () => api.get<AlertList>(`/alerts${queryString(query)}`), placeholderData: keepPreviousData });

export const useAlert = (id: number) => useQuery({ queryKey: alertKeys.detail(id), queryFn: () => api.get<AlertItem>(`/alerts/${id}`) });

/** Polled, so the count in the navigation follows evaluations made by the schedule and by imports. */
export const useAlertSummary = () =>
  useQuery({ queryKey: alertKeys.summary(), queryFn: () => api.get<{ open: number }>('/alerts/summary'), refetchInterval: 60_000 });

export function useAcknowledgeAlert() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post<AlertItem>(`/alerts/${id}/acknowledge`),
    onSuccess: (alert) => {
      client.setQueryData(alertKeys.detail(alert.id), alert);
      return client.invalidateQueries({ queryKey: alertKeys.all });
    },
  });
}

export const useAlertSettings = () => useQuery({ queryKey: alertKeys.settings, queryFn: () => api.get<AlertSettings>('/alert-settings') });

function useSettingsWrite<Vars>(send: (vars: Vars) => Promise<unknown>) {
  const client = useQueryClient();
  return useMutation({ mutationFn: send, onSuccess: () => client.invalidateQueries({ queryKey: alertKeys.settings }) });
}

export const usePatchNurseryThresholds = () => useSettingsWrite((patch: ThresholdsPatch) => api.patch<AlertSettings>('/alert-settings', patch));
export const usePatchRoomThresholds = (roomId: number) =>
  useSettingsWrite((patch: ThresholdsPatch) => api.patch<AlertSettings>(`/alert-settings/rooms/${roomId}`, patch));
export const useClearRoomThresholds = (roomId: number) => useSettingsWrite(() => api.delete(`/alert-settings/rooms/${roomId}`));

export const useSubscriptions = () => useQuery({ queryKey: alertKeys.subscriptions, queryFn: () => api.get<Subscriptions>('/alert-subscriptions') });

export function usePatchSubscriptions() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (levels: Partial<Record<SubscriptionTopic, SubscriptionLevel>>) => api.patch<Subscriptions>('/alert-subscriptions', levels),
    onSuccess: (saved) => client.setQueryData(alertKeys.subscriptions, saved),
  });
}
