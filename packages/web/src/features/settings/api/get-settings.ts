import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type Units = 'mm' | 'in';

/** One switch per kind of e-mail the site sends. */
export interface NotificationSettings {
  revisionDecided: boolean;
  buildReported: boolean;
  planAdapted: boolean;
  flagResolved: boolean;
}

export interface Settings {
  displayName: string;
  units: Units;
  notifications: NotificationSettings;
}

export const settingsPath = (login: string) => `/members/${encodeURIComponent(login)}/settings`;

export const settingsQueryOptions = (login: string) =>
  queryOptions({ queryKey: ['settings', login], queryFn: () => api<Settings>(settingsPath(login)) });

export function useSettings(login: string) {
  return useQuery(settingsQueryOptions(login));
}
