import { useOutletContext } from "react-router";
import type { UserDto } from "@shared/schemas/auth";

/** The signed-in user and what they may do, as the app layout hands it to every screen. */
export type Viewer = {
  user: UserDto;
  abilities: { draftTransfers: boolean; carryTransfers: boolean; readRuns: boolean; planRuns: boolean };
};

/** The viewer from the layout's outlet context (features cannot import the auth feature). */
export function useViewer(): Viewer {
  return useOutletContext<Viewer>();
}
