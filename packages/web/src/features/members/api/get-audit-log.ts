import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { AuditEntry, Page } from './types';

export const auditLogQueryKey = ['admin', 'audit'] as const;

export const auditLogQueryOptions = () =>
  queryOptions({
    queryKey: auditLogQueryKey,
    queryFn: () => api<Page<AuditEntry>>('/admin/audit?pageSize=10'),
  });

export function useAuditLog() {
  return useQuery(auditLogQueryOptions());
}
