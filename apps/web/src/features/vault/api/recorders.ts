import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { recorderRoutes, type CareEventInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { vaultKeys } from "./vault-keys.ts";

export const useRecorders = (options: { enabled?: boolean } = {}) =>
  useQuery({ queryKey: vaultKeys.recorders(), queryFn: ({ signal }) => callApi(recorderRoutes.list, { signal }), enabled: options.enabled ?? true });

export function useLogCare(recorderId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CareEventInput) => callApi(recorderRoutes.logCare, { params: { id: recorderId }, body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: vaultKeys.recorders() }),
  });
}
