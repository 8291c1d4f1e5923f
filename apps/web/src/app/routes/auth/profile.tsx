import { PageHeader } from "../../../components/ui/page-header.tsx";
import { LoadingState } from "../../../components/ui/states.tsx";
import { useMe } from "../../../features/auth/api/get-me.ts";
import { ProfileForm } from "../../../features/auth/components/profile-form.tsx";

export function ProfileRoute() {
  const me = useMe();
  return (
    <>
      <PageHeader title="Your profile" description="The name the studio sees on your bookings, time and activity." />
      {me.data ? <ProfileForm me={me.data} /> : <LoadingState />}
    </>
  );
}
