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

export const router = createBrowserRouter([
  { path: paths.signIn, element: <SignInRoute />, errorElement: <RouteErrorBoundary /> },
  { path: paths.welcome, element: <WelcomeRoute />, errorElement: <RouteErrorBoundary /> },
  {
    path: "/",
    element: <AppLayout />,
    errorElement: <RouteErrorBoundary />,
    children: [
      { index: true, element: <HomeRoute /> },
      { path: paths.admin.users, element: <UsersRoute /> },
      { path: paths.admin.organizations, element: <OrganizationsRoute /> },
      { path: paths.admin.mail, element: <CaughtMailRoute /> },
      { path: "*", element: <NotFoundRoute /> },
    ],
  },
]);
