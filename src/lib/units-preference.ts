import { useSyncExternalStore } from "react";
import type { UnitSystem } from "@shared/units";

const STORAGE_KEY = "hatchway.units";
const listeners = new Set<() => void>();
// Private browsing can refuse localStorage; the choice then lasts for the page's life.
let fallback: UnitSystem = "imperial";

/** The unit system the user chose last time; °F and inches when nothing valid is stored. */
export function readUnitSystem(): UnitSystem {
  try {
    const stored = localStorage.getItem(STORAGE_KEY);
    if (stored === "metric" || stored === "imperial") return stored;
    return stored === null ? fallback : "imperial";
  } catch {
    return fallback;
  }
}

/** Keeps the choice in localStorage and tells every screen showing a measurement. */
export function writeUnitSystem(system: UnitSystem): void {
  fallback = system;
  try {
    localStorage.setItem(STORAGE_KEY, system);
  } catch {
    // Kept in memory only.
  }
  listeners.forEach((listener) => listener());
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  // Another tab changing the choice updates this one too.
  const onStorage = (event: StorageEvent) => {
    if (event.key === STORAGE_KEY) listener();
  };
  window.addEventListener("storage", onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener("storage", onStorage);
  };
}

/** The current unit system and a setter; every user of the hook re-renders on a change. */
export function useUnitSystem(): [UnitSystem, (system: UnitSystem) => void] {
  const system = useSyncExternalStore(subscribe, readUnitSystem, () => "imperial" as const);
  return [system, writeUnitSystem];
}
