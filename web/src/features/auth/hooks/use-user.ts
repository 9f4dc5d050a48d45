import { useQuery } from '@tanstack/react-query';
import { meQueryOptions } from '../api/get-me';

/** The signed-in user (null for a visitor) with the query's loading and error state. */
export function useUser() {
  return useQuery(meQueryOptions());
}
