import { useMutation, useQueryClient } from "@tanstack/react-query";
import { studioDto, type UpdateStudioInput } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { studioKeys } from "./studio-keys.ts";

export const updateStudio = (input: UpdateStudioInput) => api.patch("/api/studio", input, studioDto);

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
