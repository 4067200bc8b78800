import type { AuditEntryView, ListResponse } from '@hopwise/common';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const auditQueryKey = ['audit'] as const;

export interface AuditQuery {
  limit?: number;
  offset?: number;
  /** Action or its prefix, e.g. `user` or `profile.publish`. */
  action?: string;
}

export const getAudit = (query: AuditQuery = {}, signal?: AbortSignal) =>
  api.get<ListResponse<AuditEntryView>>('/api/audit', { params: { ...query }, signal });

export const getAuditQueryOptions = (query: AuditQuery = {}) =>
  queryOptions({
    queryKey: [...auditQueryKey, query],
    queryFn: ({ signal }) => getAudit(query, signal),
    placeholderData: keepPreviousData,
  });

export const useAudit = (query: AuditQuery = {}) => useQuery(getAuditQueryOptions(query));
