import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeClockRoutes, type ProposeEditInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { timeClockKeys } from "./time-clock-keys.ts";

/** A correction to an entry, or missing time (no timeEntryId); nothing changes until a manager approves. */
export const proposeEdit = (input: ProposeEditInput) => callApi(timeClockRoutes.proposeEdit, { body: input });

export function useProposeEdit() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: proposeEdit,
    // The entry now carries a "correction waiting" flag, and the list of corrections grows.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: timeClockKeys.all }),
  });
}
