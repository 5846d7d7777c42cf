/** How often to look whether the page has settled, and the longest wait before registering anyway. */
const CHECK_MS = 1_000;
const LONGEST_WAIT_MS = 30_000;

/**
 * Registers the service worker that lets the courier's pages open without signal (DEVELOPERS.md
 * D40). Late on purpose: the worker's first visit downloads the whole app once, which on a slow
 * phone link would compete with the page a person is waiting for. So it waits for `load`, then for
 * the page to settle (`settled`: its route and data loaded, two checks in a row), then for an idle
 * moment. `onControlled` runs when a worker takes the page over (the first visit, an update): what
 * the page shows is asked again through it, so the page just opened is kept for use without signal.
 */
export function registerServiceWorker({
  settled,
  onControlled,
}: {
  settled: () => boolean;
  onControlled: () => void;
}): void {
  if (!import.meta.env.PROD || !("serviceWorker" in navigator)) return;
  const register = () => {
    navigator.serviceWorker.addEventListener("controllerchange", onControlled);
    navigator.serviceWorker.register("/sw.js", { scope: "/" }).catch(() => {
      // No worker (a private window, a browser that refuses): the pages work online as before.
    });
  };
  const whenIdle = () =>
    "requestIdleCallback" in window ? window.requestIdleCallback(register, { timeout: 5_000 }) : register();
  const afterLoad = () => {
    const started = Date.now();
    let calm = 0;
    const timer = setInterval(() => {
      calm = settled() ? calm + 1 : 0;
      if (calm >= 2 || Date.now() - started > LONGEST_WAIT_MS) {
        clearInterval(timer);
        whenIdle();
      }
    }, CHECK_MS);
  };
  if (document.readyState === "complete") afterLoad();
  else window.addEventListener("load", afterLoad, { once: true });
}
