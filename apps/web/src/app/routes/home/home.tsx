import { useSignedInUser } from "../../use-signed-in-user.ts";
import { MyDayPage } from "./my-day.tsx";
import { OurAccountPage } from "./our-account.tsx";
import { OverviewPage } from "./overview.tsx";
import { TodayPage } from "./today.tsx";

/** One address, "/", and a different first screen for each role. */
export function HomeRoute() {
  const me = useSignedInUser();
  switch (me.role) {
    case "owner":
    case "manager":
      return <TodayPage me={me} />;
    case "engineer":
      return <MyDayPage me={me} />;
    case "bookkeeper":
      return <OverviewPage me={me} />;
    case "client":
      return <OurAccountPage me={me} />;
  }
}
