import { queryOptions, useQuery, type QueryClient } from "@tanstack/react-query";
import { meRoutes, type MeDto } from "@takeup/domain";
import { ApiError, callApi } from "../../../lib/api-client.ts";
import { authKeys } from "./auth-keys.ts";

/** The signed-in person, or null when nobody is signed in (a 401 is an answer here, not an error). */
export async function getMe(signal?: AbortSignal): Promise<MeDto | null> {
  try {
    return await callApi(meRoutes.get, { signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    // Who is signed in changes only through our own sign-in, sign-out and 401 handling.
    staleTime: Infinity,
  });

export const useMe = () => useQuery(meQueryOptions());

/** Starts a fresh session in the cache: nothing the previous person loaded may linger. */
export function startSession(queryClient: QueryClient, me: MeDto) {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
  queryClient.setQueryData(authKeys.me(), me);
}

/** Marks the session as gone, so guarded screens send the person to sign in. */
export function endSession(queryClient: QueryClient) {
  queryClient.setQueryData(authKeys.me(), null);
}
