import { queryOptions, useQuery } from "@tanstack/react-query";
import { z } from "zod";
import { caughtMessageDto } from "@takeup/domain";
import { api } from "../../../lib/api-client.ts";
import { devMailKeys } from "./dev-mail-keys.ts";

export const getCaughtMail = (signal?: AbortSignal) => api.get("/api/dev/mail", z.array(caughtMessageDto), signal);

export const caughtMailQueryOptions = () =>
  queryOptions({ queryKey: devMailKeys.list(), queryFn: ({ signal }) => getCaughtMail(signal), staleTime: 0 });

export const useCaughtMail = () => useQuery(caughtMailQueryOptions());
