import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeClockRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { decisionBody, settleDecision, type DecideEditVariables } from "./settle-decision.ts";

/** Leaves the entry as it was; the note tells the person why. */
export const rejectEdit = ({ id, note }: DecideEditVariables) => callApi(timeClockRoutes.rejectEdit, { params: { id }, body: decisionBody(note) });

export function useRejectEdit() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: rejectEdit, onSuccess: () => settleDecision(queryClient) });
}
