import { useMutation, useQueryClient } from "@tanstack/react-query";
import { timeClockRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { decisionBody, settleDecision, type DecideEditVariables } from "./settle-decision.ts";

/** Writes the proposed times into the entry. 409 entry_overlap, 423 period_locked. */
export const approveEdit = ({ id, note }: DecideEditVariables) => callApi(timeClockRoutes.approveEdit, { params: { id }, body: decisionBody(note) });

export function useApproveEdit() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: approveEdit, onSuccess: () => settleDecision(queryClient) });
}
