import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeEntryEditDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { decisionBody, settleDecision, type DecideEditVariables } from "./settle-decision.ts";

/** Leaves the entry as it was; the note tells the person why. */
export const rejectEdit = ({ id, note }: DecideEditVariables) => api.post(`/api/time-entry-edits/${id}/reject`, decisionBody(note), timeEntryEditDto);

export function useRejectEdit() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: rejectEdit, onSuccess: () => settleDecision(queryClient) });
}
