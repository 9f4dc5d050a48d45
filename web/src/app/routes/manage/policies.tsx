import type { QueryClient } from '@tanstack/react-query';
import { useQuery } from '@tanstack/react-query';
import { warmSession } from '@/app/warm-session';
import { policiesQueryOptions } from '@/features/policies/api/get-policies';
import { PoliciesScreen } from '@/features/policies/components/policies-screen';
import { workshopQueryOptions } from '@/features/quotes/api/get-workshop';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await warmSession(queryClient);
  if (user?.role === 'manager') await queryClient.prefetchQuery(policiesQueryOptions());
  return null;
};

export default function PoliciesRoute() {
  const workshop = useQuery(workshopQueryOptions());
  return <PoliciesScreen timeZone={workshop.data?.timeZone} />;
}
