// GET /api/admin/settings: site-wide settings (site administrators only).
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { siteSettingsSchema, type SiteSettings } from '../../../../shared/api/schemas';

export function getSiteSettings(signal?: AbortSignal): Promise<SiteSettings> {
  return api.get('/admin/settings', siteSettingsSchema, { signal });
}

export function getSiteSettingsQueryOptions() {
  return queryOptions({
    queryKey: ['site-settings'] as const,
    queryFn: ({ signal }) => getSiteSettings(signal),
  });
}

export function useSiteSettings() {
  return useQuery(getSiteSettingsQueryOptions());
}
