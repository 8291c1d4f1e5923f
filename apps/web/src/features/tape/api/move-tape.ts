import { useMutation, useQueryClient } from "@tanstack/react-query";
import { tapeRoutes, type TapeCountInput, type TapePlanInput, type TapeSaleInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { tapeKeys } from "./tape-keys.ts";

function useStockMutation<I, O>(mutationFn: (input: I) => Promise<O>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: tapeKeys.all }) });
}

export const useSellTape = (productId: number) => useStockMutation((body: TapeSaleInput) => callApi(tapeRoutes.sell, { params: { id: productId }, body }));

export const usePostCount = () => useStockMutation((body: TapeCountInput) => callApi(tapeRoutes.count, { body }));

export const usePlanTape = () => useMutation({ mutationFn: (body: TapePlanInput) => callApi(tapeRoutes.plan, { body }) });
