import { use } from "react";
import { ToastContext, type ShowToast } from "./toast-context.ts";

export function useToast(): ShowToast {
  const show = use(ToastContext);
  if (!show) throw new Error("useToast needs a ToastProvider above it");
  return show;
}
