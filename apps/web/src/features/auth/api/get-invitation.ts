import { queryOptions, useQuery } from "@tanstack/react-query";
import { invitationDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { authKeys } from "./auth-keys.ts";

export const getInvitation = (token: string, signal?: AbortSignal) =>
  api.get(`/api/invitations/${encodeURIComponent(token)}`, invitationDto, signal);

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitation(token),
    queryFn: ({ signal }) => getInvitation(token, signal),
    staleTime: Infinity,
  });

export const useInvitation = (token: string) => useQuery(invitationQueryOptions(token));
