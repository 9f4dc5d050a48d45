import type { QueryClient } from '@tanstack/react-query';
import { warmSession } from '@/app/warm-session';
import { ruleSetsQueryOptions } from '@/features/rule-sets/api/get-rule-sets';
import { RulesScreen } from '@/features/rule-sets/components/rules-screen';

export const clientLoader = (queryClient: QueryClient) => async () => {
  const user = await warmSession(queryClient);
  if (user?.role === 'manager') await queryClient.prefetchQuery(ruleSetsQueryOptions());
  return null;
};

export default function RulesRoute() {
  return <RulesScreen />;
}
