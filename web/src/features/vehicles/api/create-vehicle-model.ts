import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { CreateVehicleModelRequest, VehicleModel } from '@/types/api';
import { vehicleModelsQueryKey } from './get-vehicle-models';

export function createVehicleModel(body: CreateVehicleModelRequest): Promise<VehicleModel> {
  return api.post<VehicleModel>('/api/vehicle-models', body);
}

export function useCreateVehicleModel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createVehicleModel,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: vehicleModelsQueryKey }),
  });
}
