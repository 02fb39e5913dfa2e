// GET /api/projects/:projectId/audit: who changed what in a project, newest first (owners only).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { auditEntrySchema, type AuditEntry } from '../../../../shared/api/schemas';

export function getAudit(projectId: number, signal?: AbortSignal): Promise<AuditEntry[]> {
  return api.get(`/projects/${projectId}/audit`, z.array(auditEntrySchema), { signal });
}

export function getAuditQueryOptions(projectId: number) {
  return queryOptions({
    queryKey: ['audit', projectId] as const,
    queryFn: ({ signal }) => getAudit(projectId, signal),
    // The trail grows with every change anyone makes; opening the tab should show the latest.
    staleTime: 0,
  });
}

export function useAudit(projectId: number) {
  return useQuery(getAuditQueryOptions(projectId));
}
