import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { engineerRateDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { roomKeys } from "./room-keys.ts";

export const getEngineerRates = (signal?: AbortSignal) => api.get("/api/engineer-rates", z.array(engineerRateDto), signal);

export const engineerRatesQueryOptions = () =>
  queryOptions({ queryKey: roomKeys.engineerRates(), queryFn: ({ signal }) => getEngineerRates(signal) });

export const useEngineerRates = ({ enabled = true }: { enabled?: boolean } = {}) => useQuery({ ...engineerRatesQueryOptions(), enabled });
