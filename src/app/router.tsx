import { createBrowserRouter } from "react-router";
import { paths } from "@/config/paths";
import { AppLayout } from "./layout";
import { HomeRoute } from "./routes/home";
import { NotFoundRoute } from "./routes/not-found";
import { RouteErrorBoundary } from "./routes/error-boundary";
import { SignInRoute } from "@/features/auth/routes/sign-in";
import { WelcomeRoute } from "@/features/auth/routes/welcome";
import { UsersRoute } from "@/features/admin/routes/users";
import { OrganizationsRoute } from "@/features/admin/routes/organizations";
import { CaughtMailRoute } from "@/features/admin/routes/caught-mail";
import { TransferNewRoute } from "@/features/transfers/routes/transfer-new";
import { TransferPageRoute } from "./routes/transfer-page";
import { TransferEditRoute } from "@/features/transfers/routes/transfer-edit";
import { TransferCustodyRoute } from "@/features/transfers/routes/transfer-custody";
import { CheckInRoute } from "@/features/check-in/routes/check-in";
import { CourierHandoffRoute } from "@/features/courier/routes/courier-handoff";
import { RegisterRoute } from "@/features/register/routes/register";
import { DocumentsRoute } from "@/features/compliance/routes/documents";
import { CanItTravelRoute } from "@/features/compliance/routes/can-it-travel";
import { RulesRoute } from "@/features/compliance/routes/rules";
import { PlanTripRoute } from "@/features/temperature/routes/plan-trip";
import { TemperatureProfilesRoute } from "@/features/temperature/routes/profiles";
import { ModelAccuracyRoute } from "@/features/temperature/routes/model-accuracy";

export const router = createBrowserRouter([
  { path: paths.signIn, element: <SignInRoute />, errorElement: <RouteErrorBoundary /> },
  { path: paths.welcome, element: <WelcomeRoute />, errorElement: <RouteErrorBoundary /> },
  {
    path: "/",
    element: <AppLayout />,
    errorElement: <RouteErrorBoundary />,
    children: [
      { index: true, element: <HomeRoute /> },
      { path: paths.transfers.new, element: <TransferNewRoute /> },
      { path: paths.transfers.detail.pattern, element: <TransferPageRoute /> },
      { path: paths.transfers.edit.pattern, element: <TransferEditRoute /> },
      { path: paths.transfers.custody.pattern, element: <TransferCustodyRoute /> },
      { path: paths.transfers.checkIn.pattern, element: <CheckInRoute /> },
      { path: paths.courier.handoff.pattern, element: <CourierHandoffRoute /> },
      { path: paths.register, element: <RegisterRoute /> },
      { path: paths.permits, element: <DocumentsRoute /> },
      { path: paths.canItTravel, element: <CanItTravelRoute /> },
      { path: paths.admin.rules, element: <RulesRoute /> },
      { path: paths.planTrip, element: <PlanTripRoute /> },
      { path: paths.modelAccuracy, element: <ModelAccuracyRoute /> },
      { path: paths.admin.temperatureProfiles, element: <TemperatureProfilesRoute /> },
      { path: paths.admin.users, element: <UsersRoute /> },
      { path: paths.admin.organizations, element: <OrganizationsRoute /> },
      { path: paths.admin.mail, element: <CaughtMailRoute /> },
      { path: "*", element: <NotFoundRoute /> },
    ],
  },
]);
