// PUT /api/admin/settings: changes site-wide settings (site administrators only).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { siteSettingsSchema, type SiteSettings } from '../../../../shared/api/schemas';
import { getSiteSettingsQueryOptions } from './get-site-settings';

export function updateSiteSettings(settings: SiteSettings): Promise<SiteSettings> {
  return api.put('/admin/settings', siteSettingsSchema.parse(settings), siteSettingsSchema);
}

export function useUpdateSiteSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSiteSettings,
    onSuccess: (settings) =>
      queryClient.setQueryData(getSiteSettingsQueryOptions().queryKey, settings),
  });
}
