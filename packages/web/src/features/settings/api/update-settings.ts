import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { settingsPath, settingsQueryOptions, type Settings } from './get-settings';

/** Saves the fields given; the answer (the settings as saved) replaces the cached ones. */
export function useUpdateSettings(login: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (changes: Partial<Settings>) => api<Settings>(settingsPath(login), { method: 'PATCH', body: changes }),
    onSuccess: (saved) => queryClient.setQueryData(settingsQueryOptions(login).queryKey, saved),
  });
}
