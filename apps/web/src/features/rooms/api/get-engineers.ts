import { queryOptions, useQuery } from "@tanstack/react-query";
import { engineerRateRoutes } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

/** Active engineers and assistants with their grade, for booking and for per-engineer rates. */
export const getEngineers = (signal?: AbortSignal) => callApi(engineerRateRoutes.engineers, { signal });

export const engineersQueryOptions = () => queryOptions({ queryKey: roomKeys.engineers(), queryFn: ({ signal }) => getEngineers(signal) });

export const useEngineers = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...engineersQueryOptions(), enabled });
