import type { MeDto } from "@takeup/domain";
import { useMe } from "../features/auth/api/get-me.ts";

/** The signed-in person, for screens that RequireRole has already let through. */
export function useSignedInUser(): MeDto {
  const { data } = useMe();
  if (!data) throw new Error("useSignedInUser is only for screens behind RequireRole");
  return data;
}
