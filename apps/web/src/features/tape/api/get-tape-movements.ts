import { useQuery } from "@tanstack/react-query";
import { tapeRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { tapeKeys } from "./tape-keys.ts";

export const useTapeMovements = (productId: number) =>
  useQuery({ queryKey: tapeKeys.movements(productId), queryFn: ({ signal }) => callApi(tapeRoutes.movements, { params: { id: productId }, signal }) });
