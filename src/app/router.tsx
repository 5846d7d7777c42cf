import type { ComponentType } from "react";
import type { QueryClient } from "@tanstack/react-query";
import { createBrowserRouter, type LoaderFunctionArgs } from "react-router";
import { Loading } from "@/components/ui/feedback";
import { paths } from "@/config/paths";
import { transferQueryOptions } from "@/lib/transfer-queries";
import { sessionQueryOptions } from "@/features/auth/api/session";
import { RouteErrorBoundary } from "./routes/error-boundary";
import { NotFoundRoute } from "./routes/not-found";

/**
 * A route whose screen is its own chunk, fetched when the route matches (React Router's `lazy`).
 * The sign-in page then needs only what it shows; heavy libraries (charts, tables, form state)
 * come with the screens that use them. The router loads a layout and its child in parallel.
 */
function screen<Name extends string>(load: () => Promise<Record<Name, ComponentType>>, name: Name) {
  return async () => ({ Component: (await load())[name] });
}

const firstLoad = (
  <div className="mx-auto max-w-6xl px-4">
    <Loading label="Opening Hatchway…" />
  </div>
);

/**
 * The app's routes. Loaders start the data a screen needs while its chunk is still on the way
 * (without waiting for it: the screen's own query picks up the request in flight), so a phone
 * on a slow link pays one round trip for code and data together, not one after the other.
 */
export function createAppRouter(queryClient: QueryClient) {
  const prefetchSession = () => {
    void queryClient.prefetchQuery(sessionQueryOptions());
    return null;
  };
  const prefetchTransfer = ({ params }: LoaderFunctionArgs) => {
    if (params.transferId) void queryClient.prefetchQuery(transferQueryOptions(params.transferId));
    return null;
  };

  return createBrowserRouter([
    {
      path: paths.signIn,
      lazy: screen(() => import("@/features/auth/routes/sign-in"), "SignInRoute"),
      errorElement: <RouteErrorBoundary />,
      hydrateFallbackElement: firstLoad,
    },
    {
      path: paths.welcome,
      lazy: screen(() => import("@/features/auth/routes/welcome"), "WelcomeRoute"),
      errorElement: <RouteErrorBoundary />,
      hydrateFallbackElement: firstLoad,
    },
    {
      path: paths.resetPassword,
      lazy: screen(() => import("@/features/auth/routes/welcome"), "WelcomeRoute"),
      errorElement: <RouteErrorBoundary />,
      hydrateFallbackElement: firstLoad,
    },
    {
      path: paths.signUp,
      lazy: screen(() => import("@/features/account/routes/sign-up"), "SignUpRoute"),
      errorElement: <RouteErrorBoundary />,
      hydrateFallbackElement: firstLoad,
    },
    {
      path: paths.signUpConfirm,
      lazy: screen(() => import("@/features/account/routes/sign-up-confirm"), "SignUpConfirmRoute"),
      errorElement: <RouteErrorBoundary />,
      hydrateFallbackElement: firstLoad,
    },
    {
      path: paths.forgotPassword,
      lazy: screen(() => import("@/features/account/routes/forgot-password"), "ForgotPasswordRoute"),
      errorElement: <RouteErrorBoundary />,
      hydrateFallbackElement: firstLoad,
    },
    {
      path: "/",
      lazy: screen(() => import("./layout"), "AppLayout"),
      loader: prefetchSession,
      errorElement: <RouteErrorBoundary />,
      hydrateFallbackElement: firstLoad,
      children: [
        { index: true, lazy: screen(() => import("./routes/home"), "HomeRoute") },
        { path: paths.account, lazy: screen(() => import("@/features/account/routes/account"), "AccountRoute") },
        { path: paths.join, lazy: screen(() => import("@/features/account/routes/join"), "JoinRoute") },
        {
          path: paths.organizationMembers,
          lazy: screen(() => import("@/features/organization/routes/members"), "MembersRoute"),
        },
        {
          path: paths.transfers.new,
          lazy: screen(() => import("@/features/transfers/routes/transfer-new"), "TransferNewRoute"),
        },
        {
          path: paths.transfers.detail.pattern,
          loader: prefetchTransfer,
          lazy: screen(() => import("./routes/transfer-page"), "TransferPageRoute"),
        },
        {
          path: paths.transfers.edit.pattern,
          lazy: screen(() => import("@/features/transfers/routes/transfer-edit"), "TransferEditRoute"),
        },
        {
          path: paths.transfers.custody.pattern,
          lazy: screen(() => import("@/features/transfers/routes/transfer-custody"), "TransferCustodyRoute"),
        },
        {
          path: paths.transfers.checkIn.pattern,
          lazy: screen(() => import("@/features/check-in/routes/check-in"), "CheckInRoute"),
        },
        {
          path: paths.courier.handoff.pattern,
          loader: prefetchTransfer,
          lazy: screen(() => import("@/features/courier/routes/courier-handoff"), "CourierHandoffRoute"),
        },
        { path: paths.runs, lazy: screen(() => import("@/features/runs/routes/runs"), "RunsRoute") },
        { path: paths.runNew, lazy: screen(() => import("@/features/runs/routes/run-new"), "RunNewRoute") },
        { path: paths.run.pattern, lazy: screen(() => import("@/features/runs/routes/run-page"), "RunPageRoute") },
        { path: paths.register, lazy: screen(() => import("@/features/register/routes/register"), "RegisterRoute") },
        {
          path: paths.registerEntry.pattern,
          lazy: screen(() => import("@/features/register/routes/register-entry"), "RegisterEntryRoute"),
        },
        {
          path: paths.registerAdd,
          lazy: screen(() => import("@/features/register/routes/register-add"), "RegisterAddRoute"),
        },
        {
          path: paths.registerImport,
          lazy: screen(() => import("@/features/register/routes/register-import"), "RegisterImportRoute"),
        },
        {
          path: paths.registerReport,
          lazy: screen(() => import("@/features/register/routes/register-report"), "RegisterReportRoute"),
        },
        {
          path: paths.registerSettings,
          lazy: screen(() => import("@/features/register/routes/register-settings"), "RegisterSettingsRoute"),
        },
        { path: paths.permits, lazy: screen(() => import("@/features/compliance/routes/documents"), "DocumentsRoute") },
        {
          path: paths.canItTravel,
          lazy: screen(() => import("@/features/compliance/routes/can-it-travel"), "CanItTravelRoute"),
        },
        { path: paths.admin.rules, lazy: screen(() => import("@/features/compliance/routes/rules"), "RulesRoute") },
        {
          path: paths.planTrip,
          lazy: screen(() => import("@/features/temperature/routes/plan-trip"), "PlanTripRoute"),
        },
        {
          path: paths.modelAccuracy,
          lazy: screen(() => import("@/features/temperature/routes/model-accuracy"), "ModelAccuracyRoute"),
        },
        {
          path: paths.admin.temperatureProfiles,
          lazy: screen(() => import("@/features/temperature/routes/profiles"), "TemperatureProfilesRoute"),
        },
        { path: paths.admin.users, lazy: screen(() => import("@/features/admin/routes/users"), "UsersRoute") },
        {
          path: paths.admin.organizations,
          lazy: screen(() => import("@/features/admin/routes/organizations"), "OrganizationsRoute"),
        },
        {
          path: paths.admin.mail,
          lazy: screen(() => import("@/features/admin/routes/caught-mail"), "CaughtMailRoute"),
        },
        { path: "*", element: <NotFoundRoute /> },
      ],
    },
  ]);
}
