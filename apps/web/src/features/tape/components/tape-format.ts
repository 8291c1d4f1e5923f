import { formatMoney, type TapeProductDto } from "@takeup/domain";

const fraction: Record<number, string> = { 0.25: "1/4", 0.5: "1/2", 1: "1", 2: "2", 10.5: "10½" };
export const inches = (n: number) => `${fraction[n] ?? n} in`;
export const productSize = (p: Pick<TapeProductDto, "widthInches" | "lengthFt" | "reelInches">) => `${inches(p.widthInches)} · ${p.lengthFt.toLocaleString("en-US")} ft · ${inches(p.reelInches)} reel`;
export const money = (cents: number | null, currency: string) => (cents === null ? "—" : formatMoney(cents, currency));
export const percent = (bp: number | null) => (bp === null ? "—" : `${(bp / 100).toFixed(1)} %`);
