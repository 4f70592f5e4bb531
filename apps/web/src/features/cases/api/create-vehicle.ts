// POST /api/vehicles: adds a vehicle. 409 means its VIN or plate is already on file.
import { vehicleSchema, type VehicleInput } from '@heatpath/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { vehiclesKeys } from '../../../lib/query-keys';

export function createVehicle(body: VehicleInput) {
  return apiRequest('/api/vehicles', vehicleSchema, { method: 'POST', body });
}

export function useCreateVehicle() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createVehicle,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: vehiclesKeys.all }),
  });
}
