/** Our own palette for telling rooms apart on the calendar (names are ours, hex values below). */
export const roomColours = ["rust", "moss", "slate", "ochre", "plum", "teal"] as const;
export type RoomColour = (typeof roomColours)[number];
export const roomColourHex: Record<RoomColour, string> = {
  rust: "#9c4221",
  moss: "#5f7a3a",
  slate: "#4a5d73",
  ochre: "#b7861f",
  plum: "#74456b",
  teal: "#2f7a77",
};

export const equipmentKinds = ["tape_recorder", "console", "microphone", "outboard", "instrument", "other"] as const;
export type EquipmentKind = (typeof equipmentKinds)[number];
export const equipmentKindLabels: Record<EquipmentKind, string> = {
  tape_recorder: "Tape recorder",
  console: "Mixing console",
  microphone: "Microphone",
  outboard: "Outboard",
  instrument: "Instrument",
  other: "Other",
};

/** Grades of engineer a client is billed for. */
export const engineerGrades = ["engineer", "assistant"] as const;
export type EngineerGrade = (typeof engineerGrades)[number];

/** Standard tape widths, in thousandths of an inch. */
export const tapeWidthsMils = [250, 500, 1000, 2000] as const;
export const tapeWidthLabel = (mils: number) => ({ 250: "1/4 inch", 500: "1/2 inch", 1000: "1 inch", 2000: "2 inch" })[mils] ?? `${mils / 1000} inch`;
