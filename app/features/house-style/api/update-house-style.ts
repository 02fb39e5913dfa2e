// PUT /api/projects/:projectId/house-style: replaces the project's house style (owners only).
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { api } from '../../../lib/api-client';
import {
  houseStyleInputSchema,
  houseStyleSchema,
  type HouseStyle,
} from '../../../../shared/spec/house-style';
import { getHouseStyleQueryOptions } from './get-house-style';

export type HouseStyleInput = z.input<typeof houseStyleInputSchema>;

export function updateHouseStyle(projectId: number, input: HouseStyleInput): Promise<HouseStyle> {
  return api.put(
    `/projects/${projectId}/house-style`,
    houseStyleInputSchema.parse(input),
    houseStyleSchema,
  );
}

export function useUpdateHouseStyle(projectId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: HouseStyleInput) => updateHouseStyle(projectId, input),
    onSuccess: (style) =>
      queryClient.setQueryData(getHouseStyleQueryOptions(projectId).queryKey, style),
  });
}
