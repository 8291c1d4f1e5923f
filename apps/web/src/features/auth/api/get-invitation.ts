import { queryOptions, useQuery } from "@tanstack/react-query";
import { invitationRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { authKeys } from "./auth-keys.ts";

export const getInvitation = (token: string, signal?: AbortSignal) =>
  callApi(invitationRoutes.get, { params: { token }, signal });

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
    staleTime: Infinity,
  });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
