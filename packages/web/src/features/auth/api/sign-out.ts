import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { meQueryOptions } from './get-me';

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>('/auth/sign-out', { method: 'POST' }),
    onSuccess: () => queryClient.setQueryData(meQueryOptions().queryKey, null),
  });
}
