import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { reelRoutes, routeUrl, type CheckInInput, type CheckOutInput, type ReelDetailDto, type ReelStatus, type ReleaseInput, type TrackSheetInput } from "@takeup/domain";
import { callApi } from "../../../lib/api-client.ts";
import { vaultKeys } from "./vault-keys.ts";

export type ReelFilters = { status?: ReelStatus; q?: string };

export const useReels = (filters: ReelFilters) =>
  useQuery({ queryKey: vaultKeys.reelList(filters), queryFn: ({ signal }) => callApi(reelRoutes.list, { query: filters, signal }) });

export const reelQueryOptions = (id: number) =>
  queryOptions({ queryKey: vaultKeys.reel(id), queryFn: ({ signal }) => callApi(reelRoutes.get, { params: { id }, signal }) });
export const useReel = (id: number) => useQuery(reelQueryOptions(id));

export const scanReel = (label: string) => callApi(reelRoutes.scan, { query: { label } });

/** The box label's address, for a plain download link. */
export const reelLabelHref = (id: number) => routeUrl(reelRoutes.label.path, { id });

function useReelWrite<I>(id: number, write: (input: I) => Promise<ReelDetailDto>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: write,
    onSuccess: (reel) => {
      queryClient.setQueryData(vaultKeys.reel(id), reel);
      return queryClient.invalidateQueries({ queryKey: [...vaultKeys.reels(), "list"] });
    },
  });
}

export const useSaveTrackSheet = (id: number) => useReelWrite(id, (body: TrackSheetInput) => callApi(reelRoutes.trackSheet, { params: { id }, body }));
export const useCheckOut = (id: number) => useReelWrite(id, (body: CheckOutInput) => callApi(reelRoutes.checkOut, { params: { id }, body }));
export const useCheckIn = (id: number) => useReelWrite(id, (body: CheckInInput) => callApi(reelRoutes.checkIn, { params: { id }, body }));
export const useRelease = (id: number) => useReelWrite(id, (body: ReleaseInput) => callApi(reelRoutes.release, { params: { id }, body }));
