import { queryOptions, useQuery } from "@tanstack/react-query";
import { engineerRateRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const getEngineerRates = (signal?: AbortSignal) => callApi(engineerRateRoutes.list, { signal });

export const engineerRatesQueryOptions = () =>
  queryOptions({ queryKey: roomKeys.engineerRates(), queryFn: ({ signal }) => getEngineerRates(signal) });

export const useEngineerRates = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...engineerRatesQueryOptions(), enabled });
