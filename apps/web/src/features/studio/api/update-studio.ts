import { useMutation, useQueryClient } from "@tanstack/react-query";
import { studioRoutes, type UpdateStudioInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { studioKeys } from "./studio-keys.ts";

export const updateStudio = (input: UpdateStudioInput) => callApi(studioRoutes.update, { body: input });

export function useUpdateStudio() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateStudio,
    onSuccess: (studio) => {
      queryClient.setQueryData(studioKeys.detail(), studio);
      return queryClient.invalidateQueries({ queryKey: studioKeys.all });
    },
  });
}
