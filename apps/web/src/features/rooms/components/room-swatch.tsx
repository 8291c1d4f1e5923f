import { roomColourHex, type RoomColour } from "@takeup/domain";
import { cx } from "../../../lib/cx.ts";

export function RoomSwatch({ colour, className }: { colour: RoomColour; className?: string }) {
  return (
    <span
      aria-hidden="true"
      className={cx("inline-block size-3 shrink-0 rounded-sm ring-1 ring-ink/15", className)}
      style={{ backgroundColor: roomColourHex[colour] }}
    />
  );
}
