import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiErrorDto, routeUrl, tapeMovementDto, tapeRoutes, type TapeMovementDto } from "@takeup/domain";
import { ApiError } from "../../../lib/api-client.ts";
import { tapeKeys } from "./tape-keys.ts";

export type ReceiveTapeForm = { quantity: string; unitCostCents: string; supplier: string; receivedOn: string; file: File };

/**
 * Sends a receipt as multipart/form-data through XMLHttpRequest, the one browser API that reports
 * upload progress; the route and its answer still come from the shared contract.
 */
export function receiveTape(productId: number, form: ReceiveTapeForm, onProgress: (fraction: number) => void): Promise<TapeMovementDto> {
  const body = new FormData();
  body.set("quantity", form.quantity);
  body.set("unitCostCents", form.unitCostCents);
  body.set("supplier", form.supplier);
  body.set("receivedOn", form.receivedOn);
  body.set("file", form.file);
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open(tapeRoutes.receive.method.toUpperCase(), routeUrl(tapeRoutes.receive.path, { id: productId }));
    xhr.setRequestHeader("accept", "application/json");
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    xhr.onerror = () => reject(new ApiError(0, "network_error", "Takeup could not reach the server. Check the connection and try again."));
    xhr.onload = () => {
      let data: unknown;
      try {
        data = JSON.parse(xhr.responseText);
      } catch {
        data = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        const parsed = tapeMovementDto.safeParse(data);
        if (parsed.success) resolve(parsed.data);
        else reject(new ApiError(xhr.status, "unexpected_response", "The server sent an answer Takeup did not expect."));
        return;
      }
      const error = apiErrorDto.safeParse(data);
      reject(
        error.success
          ? new ApiError(xhr.status, error.data.error.code, error.data.error.message, error.data.error.details)
          : new ApiError(xhr.status, "unexpected_response", `The server answered with an error (${xhr.status}). Try again in a moment.`),
      );
    };
    xhr.send(body);
  });
}

export function useReceiveTape(productId: number, onProgress: (fraction: number) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (form: ReceiveTapeForm) => receiveTape(productId, form, onProgress),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: tapeKeys.all }),
  });
}
