/** The five roles of BRIEF.md; what each may do is the matrix in docs/roles.md. */
export const roles = ["owner", "manager", "engineer", "bookkeeper", "client"] as const;
export type Role = (typeof roles)[number];

export const staffRoles = ["owner", "manager", "engineer", "bookkeeper"] as const;
export type StaffRole = (typeof staffRoles)[number];

export const roleLabels: Record<Role, string> = {
  owner: "Owner",
  manager: "Studio manager",
  engineer: "Engineer",
  bookkeeper: "Bookkeeper",
  client: "Client",
};

export const isStaffRole = (role: Role): role is StaffRole => role !== "client";
