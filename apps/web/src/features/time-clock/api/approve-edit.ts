import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeEntryEditDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { decisionBody, settleDecision, type DecideEditVariables } from "./settle-decision.ts";

/** Writes the proposed times into the entry. 409 entry_overlap, 423 period_locked. */
export const approveEdit = ({ id, note }: DecideEditVariables) => api.post(`/api/time-entry-edits/${id}/approve`, decisionBody(note), timeEntryEditDto);

export function useApproveEdit() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: approveEdit, onSuccess: () => settleDecision(queryClient) });
}
