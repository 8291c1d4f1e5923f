import { roleLabels, staffRoles, type StaffMemberDto, type StaffRole } from "@takeup/domain";
import { Select } from "../../../components/ui/select.tsx";
import { useToast } from "../../../components/ui/use-toast.ts";
import { errorMessage } from "../../../lib/api-client.ts";
import { useUpdateStaff } from "../api/update-staff.ts";

export function MemberRoleSelect({ member }: { member: StaffMemberDto }) {
  const toast = useToast();
  const update = useUpdateStaff();
  // While saving, show the chosen role; on failure the list's own value comes back.
  const shown = update.isPending && update.variables.role ? update.variables.role : member.role;

  const onChange = (role: StaffRole) => {
    update.mutate(
      { userId: member.userId, role },
      {
        onSuccess: (saved) => toast(`${saved.name} is now ${roleLabels[saved.role]}`),
        onError: (error) => toast(errorMessage(error), "error"),
      },
    );
  };

  return (
    <Select
      size="sm"
      aria-label={`Role for ${member.name}`}
      value={shown}
      disabled={update.isPending}
      onChange={(event) => onChange(event.target.value as StaffRole)}
      className="w-40"
    >
      {staffRoles.map((role) => (
        <option key={role} value={role}>
          {roleLabels[role]}
        </option>
      ))}
    </Select>
  );
}
