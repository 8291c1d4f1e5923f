import type { EngineerGrade, RoomColour } from "@takeup/domain";

/** Our names for the room palette, shown next to each swatch. */
export const roomColourLabels: Record<RoomColour, string> = {
  rust: "Rust",
  moss: "Moss",
  slate: "Slate",
  ochre: "Ochre",
  plum: "Plum",
  teal: "Teal",
};

export const engineerGradeLabels: Record<EngineerGrade, string> = {
  engineer: "Engineer",
  assistant: "Assistant engineer",
};
