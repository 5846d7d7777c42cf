/**
 * The service worker's cache of API answers (DEVELOPERS.md D40): the build names it in the worker,
 * the client empties it at sign-out and when another person signs in on the phone.
 */
export const OFFLINE_API_CACHE = "hatchway-api";

/** How long the courier's pages wait for the network before the phone's copy is shown. */
export const OFFLINE_NETWORK_TIMEOUT_S = 4;

/** A copy older than this is not shown: a week covers a scheduled run. */
export const OFFLINE_API_MAX_AGE_S = 7 * 24 * 3600;
