import { useState } from "react";
import { createBrowserRouter, RouterProvider, type RouteObject } from "react-router";
import { areaRoles } from "../config/access.ts";
import { paths } from "../config/paths.ts";
import { RequireRole } from "./require-role.tsx";
import { ActivityRoute } from "./routes/activity/activity.tsx";
import { AppRoot } from "./routes/app-root.tsx";
import { BookingsRoute } from "./routes/bookings/bookings.tsx";
import { CalendarRoute } from "./routes/calendar/calendar.tsx";
import { AcceptInvitationRoute } from "./routes/auth/accept-invitation.tsx";
import { ForgotPasswordRoute } from "./routes/auth/forgot-password.tsx";
import { ResetPasswordRoute } from "./routes/auth/reset-password.tsx";
import { SignInRoute } from "./routes/auth/sign-in.tsx";
import { ClientRoute } from "./routes/clients/client.tsx";
import { ClientsRoute } from "./routes/clients/clients.tsx";
import { DevMailRoute } from "./routes/dev/mail.tsx";
import { HomeRoute } from "./routes/home/home.tsx";
import { NotFoundRoute } from "./routes/not-found.tsx";
import { RoomsRoute } from "./routes/rooms/rooms.tsx";
import { RouteError } from "./routes/route-error.tsx";
import { MySessionsRoute } from "./routes/sessions/my-sessions.tsx";
import { SessionsRoute } from "./routes/sessions/sessions.tsx";
import { SettingsRoute } from "./routes/settings/settings.tsx";
import { TeamRoute } from "./routes/team/team.tsx";

export const routes: RouteObject[] = [
  {
    errorElement: <RouteError />,
    children: [
      { path: paths.signIn.path, element: <SignInRoute /> },
      { path: paths.forgotPassword.path, element: <ForgotPasswordRoute /> },
      { path: paths.resetPassword.path, element: <ResetPasswordRoute /> },
      { path: paths.invitation.path, element: <AcceptInvitationRoute /> },
      {
        path: paths.home.path,
        element: <AppRoot />,
        children: [
          { index: true, element: <HomeRoute /> },
          {
            path: paths.clients.list.path,
            element: (
              <RequireRole roles={areaRoles.clients}>
                <ClientsRoute />
              </RequireRole>
            ),
          },
          {
            path: paths.clients.detail.path,
            element: (
              <RequireRole roles={areaRoles.clients}>
                <ClientRoute />
              </RequireRole>
            ),
          },
          {
            path: paths.calendar.path,
            element: (
              <RequireRole roles={areaRoles.calendar}>
                <CalendarRoute />
              </RequireRole>
            ),
          },
          {
            path: paths.bookings.path,
            element: (
              <RequireRole roles={areaRoles.bookings}>
                <BookingsRoute />
              </RequireRole>
            ),
          },
          {
            path: paths.rooms.path,
            element: (
              <RequireRole roles={areaRoles.rooms}>
                <RoomsRoute />
              </RequireRole>
            ),
          },
          {
            path: paths.mySessions.path,
            element: (
              <RequireRole roles={areaRoles.mySessions}>
                <MySessionsRoute />
              </RequireRole>
            ),
          },
          {
            path: paths.sessions.path,
            element: (
              <RequireRole roles={areaRoles.sessions}>
                <SessionsRoute />
              </RequireRole>
            ),
          },
          {
            path: paths.team.path,
            element: (
              <RequireRole roles={areaRoles.team}>
                <TeamRoute />
              </RequireRole>
            ),
          },
          {
            path: paths.settings.path,
            element: (
              <RequireRole roles={areaRoles.settings}>
                <SettingsRoute />
              </RequireRole>
            ),
          },
          {
            path: paths.activity.path,
            element: (
              <RequireRole roles={areaRoles.activity}>
                <ActivityRoute />
              </RequireRole>
            ),
          },
          {
            path: paths.devMail.path,
            element: (
              <RequireRole roles={areaRoles.devMail}>
                <DevMailRoute />
              </RequireRole>
            ),
          },
          { path: "*", element: <NotFoundRoute /> },
        ],
      },
    ],
  },
];

export function AppRouter() {
  const [router] = useState(() => createBrowserRouter(routes));
  return <RouterProvider router={router} />;
}
