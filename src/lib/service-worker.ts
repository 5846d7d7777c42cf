/**
 * Registers the service worker that lets the courier's pages open without signal (DEVELOPERS.md
 * D40). Late on purpose: after the page has loaded and the phone is idle, so the worker's first
 * download of the app never competes with the page a person is waiting for. `onControlled` runs
 * when a worker takes the page over (the first visit, an update): what the page shows is asked
 * again through it, so the page just opened is kept for use without signal too.
 */
export function registerServiceWorker({ onControlled }: { onControlled: () => void }): void {
  if (!import.meta.env.PROD || !("serviceWorker" in navigator)) return;
  const register = () => {
    navigator.serviceWorker.addEventListener("controllerchange", onControlled);
    navigator.serviceWorker.register("/sw.js", { scope: "/" }).catch(() => {
      // No worker (a private window, a browser that refuses): the pages work online as before.
    });
  };
  const whenIdle = () =>
    "requestIdleCallback" in window
      ? window.requestIdleCallback(register, { timeout: 10_000 })
      : setTimeout(register, 3_000);
  if (document.readyState === "complete") whenIdle();
  else window.addEventListener("load", whenIdle, { once: true });
}
