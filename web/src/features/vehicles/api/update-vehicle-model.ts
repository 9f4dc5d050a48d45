import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { UpdateVehicleModelRequest, VehicleModel } from '@/types/api';
import { vehicleModelsQueryKey } from './get-vehicle-models';

export interface UpdateVehicleModelInput {
  id: string;
  changes: UpdateVehicleModelRequest;
}

export function updateVehicleModel({
  id,
  changes,
}: UpdateVehicleModelInput): Promise<VehicleModel> {
  return api.patch<VehicleModel>(`/api/vehicle-models/${encodeURIComponent(id)}`, changes);
}

export function useUpdateVehicleModel() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateVehicleModel,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: vehicleModelsQueryKey }),
  });
}
