// PATCH /api/me/preferences: remembers a person's unit choices (the calculators, the case
// page's readings and the logs chart all read the same ones). The change shows at once
// (optimistic) and is rolled back if the server refuses it. When choices follow each other
// quickly (°F then back to °C), no single answer is written into the cache — an earlier answer
// arriving late would undo the later choice; when the last one finishes, the person is read
// again from the server.
import { meSchema, type Me, type UpdatePreferencesRequest } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from './api-client';
import { meQueryKey } from './auth';
import { saveCacheNow } from './persist-cache';

export function updateUnitPreferences(body: UpdatePreferencesRequest) {
  return apiRequest('/api/me/preferences', meSchema, { method: 'PATCH', body });
}

const mutationKey = ['me', 'preferences', 'update'] as const;

export function useUpdateUnitPreferences() {
  const queryClient = useQueryClient();
  // Inside the callbacks the finishing mutation still counts, so 1 means "no other is running".
  const isLast = () => queryClient.isMutating({ mutationKey }) === 1;
  return useMutation({
    mutationKey,
    mutationFn: updateUnitPreferences,
    onMutate: (body) => {
      // Synchronous on purpose: a controlled radio must show the new choice in the same tick as
      // the tap. Cancelling puts back, at once, the state from before any read still in flight,
      // and the choice is written over it.
      void queryClient.cancelQueries({ queryKey: meQueryKey });
      const previous = queryClient.getQueryData<Me>(meQueryKey);
      if (previous) {
        queryClient.setQueryData<Me>(meQueryKey, {
          ...previous,
          preferences: {
            ...previous.preferences,
            units: { ...previous.preferences.units, ...body.units },
          },
        });
        // Kept on the tablet now: offline, this is the preference the next steps start from,
        // also after a reload.
        void saveCacheNow(queryClient);
      }
      return { previous };
    },
    onError: (_error, _body, context) => {
      if (context?.previous && isLast()) queryClient.setQueryData(meQueryKey, context.previous);
    },
    onSettled: () => {
      if (isLast()) return queryClient.invalidateQueries({ queryKey: meQueryKey });
    },
  });
}
