import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { RouterProvider } from "react-router";
import { AppProviders, createQueryClient } from "./app/providers";
import { createAppRouter } from "./app/router";
import { registerServiceWorker } from "./lib/service-worker";
import "./index.css";

const client = createQueryClient();
const router = createAppRouter(client);

createRoot(document.getElementById("root")!).render(
  <StrictMode>
    <AppProviders client={client}>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);

registerServiceWorker({
  settled: () =>
    router.state.initialized &&
    router.state.navigation.state === "idle" &&
    client.isFetching() === 0 &&
    client.isMutating() === 0,
  onControlled: () => void client.refetchQueries({ type: "active" }),
});
