export * from "./label-id.ts";
export { chargeableMonths, feeNoticeDate, feeStartDate, monthBefore, type StorageFeeRule } from "./storage-fees.ts";
export { addDays as addLocalDays } from "./storage-fees.ts";
export * from "./recorder-care.ts";
export * from "./catalogue.ts";
