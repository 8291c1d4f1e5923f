import { queryOptions, useQuery } from "@tanstack/react-query";
import { tapeRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { tapeKeys } from "./tape-keys.ts";

export const tapeProductsQueryOptions = () => queryOptions({ queryKey: tapeKeys.products(), queryFn: ({ signal }) => callApi(tapeRoutes.listProducts, { signal }) });

export const useTapeProducts = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...tapeProductsQueryOptions(), enabled });
