// PATCH /api/me/preferences: remembers a person's unit choices. The change shows at once
// (optimistic) and is rolled back if the server refuses it.
import { meSchema, type Me, type UpdatePreferencesRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/auth';

export function updateUnitPreferences(body: UpdatePreferencesRequest) {
  return apiRequest('/api/me/preferences', meSchema, { method: 'PATCH', body });
}

export function useUpdateUnitPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUnitPreferences,
    onMutate: async (body) => {
      await queryClient.cancelQueries({ queryKey: meQueryKey });
      const previous = queryClient.getQueryData<Me>(meQueryKey);
      if (previous) {
        queryClient.setQueryData<Me>(meQueryKey, {
          ...previous,
          preferences: {
            ...previous.preferences,
            units: { ...previous.preferences.units, ...body.units },
          },
        });
      }
      return { previous };
    },
    onError: (_error, _body, context) => {
      if (context?.previous) queryClient.setQueryData(meQueryKey, context.previous);
    },
    onSuccess: (me) => queryClient.setQueryData(meQueryKey, me),
    onSettled: () => queryClient.invalidateQueries({ queryKey: meQueryKey }),
  });
}
