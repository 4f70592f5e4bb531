// PATCH /api/me/preferences for the chart's °C/°F switch: the person's one unit preference, the
// same the calculators and the case page read. Shown at once, rolled back if refused.
import { meSchema, type Me, type UnitPreferences } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { meQueryKey } from '../../../lib/auth';

export function updateTemperatureUnit(temperature: UnitPreferences['temperature']) {
  return apiRequest('/api/me/preferences', meSchema, {
    method: 'PATCH',
    body: { units: { temperature } },
  });
}

export function useUpdateTemperatureUnit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateTemperatureUnit,
    onMutate: async (temperature) => {
      await queryClient.cancelQueries({ queryKey: meQueryKey });
      const previous = queryClient.getQueryData<Me>(meQueryKey);
      if (previous) {
        queryClient.setQueryData<Me>(meQueryKey, {
          ...previous,
          preferences: {
            ...previous.preferences,
            units: { ...previous.preferences.units, temperature },
          },
        });
      }
      return { previous };
    },
    onError: (_error, _value, context) => {
      if (context?.previous) queryClient.setQueryData(meQueryKey, context.previous);
    },
    onSuccess: (me) => queryClient.setQueryData(meQueryKey, me),
  });
}
