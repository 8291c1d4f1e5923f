import { useState, type ReactNode } from "react";
import type { Role } from "@takeup/domain";
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
import { BillableRoute } from "./routes/invoices/billable.tsx";
import { InvoiceRoute } from "./routes/invoices/invoice.tsx";
import { InvoiceSettingsRoute } from "./routes/invoices/invoice-settings.tsx";
import { InvoicesRoute } from "./routes/invoices/invoices.tsx";
import { ReceivablesRoute } from "./routes/invoices/receivables.tsx";
import { ReelRoute } from "./routes/vault/reel.tsx";
import { VaultRoute } from "./routes/vault/vault.tsx";
import { DevMailRoute } from "./routes/dev/mail.tsx";
import { HomeRoute } from "./routes/home/home.tsx";
import { NotFoundRoute } from "./routes/not-found.tsx";
import { RoomsRoute } from "./routes/rooms/rooms.tsx";
import { TapePlannerRoute } from "./routes/tape/tape-planner.tsx";
import { TapeStockRoute } from "./routes/tape/tape-stock.tsx";
import { RouteError } from "./routes/route-error.tsx";
import { MySessionsRoute } from "./routes/sessions/my-sessions.tsx";
import { SessionsRoute } from "./routes/sessions/sessions.tsx";
import { PayPeriodPage } from "./routes/payroll/pay-period.tsx";
import { PayPeriodPersonPage } from "./routes/payroll/pay-period-person.tsx";
import { PayPeriodsPage } from "./routes/payroll/pay-periods.tsx";
import { PayRatesPage } from "./routes/payroll/pay-rates.tsx";
import { PayrollSettingsPage } from "./routes/payroll/payroll-settings.tsx";
import { ApprovalsPage } from "./routes/time/approvals.tsx";
import { ClockPage } from "./routes/time/clock.tsx";
import { MyTimesheetPage } from "./routes/time/my-timesheet.tsx";
import { SettingsRoute } from "./routes/settings/settings.tsx";
import { ProfileRoute } from "./routes/auth/profile.tsx";
import { TeamRoute } from "./routes/team/team.tsx";

/** A screen only the given roles may open; everyone else gets "Not allowed here". */
function guarded(path: string, roles: readonly Role[], element: ReactNode): RouteObject {
  return { path, element: <RequireRole roles={roles}>{element}</RequireRole> };
}

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
          guarded(paths.clients.list.path, areaRoles.clients, <ClientsRoute />),
          guarded(paths.clients.detail.path, areaRoles.clients, <ClientRoute />),
          guarded(paths.calendar.path, areaRoles.calendar, <CalendarRoute />),
          guarded(paths.bookings.path, areaRoles.bookings, <BookingsRoute />),
          guarded(paths.rooms.path, areaRoles.rooms, <RoomsRoute />),
          guarded(paths.tapeStock.path, areaRoles.tapeStock, <TapeStockRoute />),
          guarded(paths.tapePlanner.path, areaRoles.tapePlanner, <TapePlannerRoute />),
          guarded(paths.vault.list.path, areaRoles.vault, <VaultRoute />),
          guarded(paths.vault.reel.path, areaRoles.vault, <ReelRoute />),
          guarded(paths.mySessions.path, areaRoles.mySessions, <MySessionsRoute />),
          guarded(paths.sessions.path, areaRoles.sessions, <SessionsRoute />),
          guarded(paths.clock.path, areaRoles.clock, <ClockPage />),
          guarded(paths.myTimesheet.path, areaRoles.myTimesheet, <MyTimesheetPage />),
          guarded(paths.approvals.path, areaRoles.approvals, <ApprovalsPage />),
          guarded(paths.payPeriods.list.path, areaRoles.payPeriods, <PayPeriodsPage />),
          guarded(paths.payPeriods.detail.path, areaRoles.payPeriods, <PayPeriodPage />),
          guarded(paths.payPeriods.person.path, areaRoles.payPeriods, <PayPeriodPersonPage />),
          guarded(paths.payRates.path, areaRoles.payRates, <PayRatesPage />),
          guarded(paths.payrollSettings.path, areaRoles.payrollSettings, <PayrollSettingsPage />),
          guarded(paths.team.path, areaRoles.team, <TeamRoute />),
          guarded(paths.settings.path, areaRoles.settings, <SettingsRoute />),
          guarded(paths.profile.path, areaRoles.profile, <ProfileRoute />),
          guarded(paths.activity.path, areaRoles.activity, <ActivityRoute />),
          guarded(paths.devMail.path, areaRoles.devMail, <DevMailRoute />),
          guarded(paths.invoices.list.path, areaRoles.invoices, <InvoicesRoute />),
          guarded(paths.invoices.detail.path, areaRoles.invoices, <InvoiceRoute />),
          guarded(paths.invoices.billable.path, areaRoles.billable, <BillableRoute />),
          guarded(paths.receivables.path, areaRoles.receivables, <ReceivablesRoute />),
          guarded(paths.invoiceSettings.path, areaRoles.invoiceSettings, <InvoiceSettingsRoute />),
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
