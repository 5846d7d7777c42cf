import { Router, type Request } from "express";
import { excerpt } from "@shared/validation/text";
import { z } from "zod";
import { PROFILE_GROUPS } from "@shared/constants";
import { profileDataSchema } from "@shared/temperature/profile-schema";
import { legVehicleInputSchema, tripPlanInputSchema, whatIfInputSchema } from "@shared/temperature/schemas";
import type { AppContext } from "../../context";
import { HttpError, invalidField, unavailable } from "../../http/errors";
import { currentUser, requirePolicy, requireUser } from "../../http/guards";
import { parse, pathId, pathParam } from "../../http/validate";
import {
  canEditTemperatureProfiles,
  canPlanTrips,
  canReadModelAccuracy,
  canSwitchWeatherScenario,
} from "../../policies/temperature.policy";
import { presentProfile, presentTransferTemperature, presentTripPlan } from "../../presenters/temperature.presenter";
import { latestAlert, recentChecks } from "../../services/temperature/checks";
import { loadProfileRows, loadProfiles, saveProfile } from "../../services/temperature/profiles";
import { modelAccuracy, pickupAt, readingsAgainstReport, transferReadings } from "../../services/temperature/readings";
import { assessTransferTemperature } from "../../services/temperature/transfer-temperature";
import { declareLegVehicle, legsWithCouriers, updateTripPlan } from "../../services/temperature/trip-plan";
import { assessWhatIf, findTaxonByName } from "../../services/temperature/what-if";
import { loadTransferForActor } from "../../services/transfers/load";
import { searchTaxa } from "../taxa/taxa.router";

const groupParam = z.enum(PROFILE_GROUPS, { message: "Name a temperature profile group" });
const scenarioSchema = z.strictObject({
  scenario: z.string().regex(/^[a-z_]{1,40}$/, "a scenario name such as heat_wave"),
});
const FAKE_CONTROL_TIMEOUT_MS = 3000;

/** Asks the weather fake's control endpoint; a fake that does not answer is a 503. */
async function callWeatherFake(controlUrl: string, init: RequestInit = {}): Promise<Response> {
  try {
    return await fetch(controlUrl, {
      ...init,
      redirect: "error",
      signal: AbortSignal.timeout(FAKE_CONTROL_TIMEOUT_MS),
    });
  } catch (err) {
    throw unavailable(`The local weather fake is not answering (${(err as Error).message}).`);
  }
}

function weatherFakeUrl(ctx: AppContext): string {
  const url = ctx.env.WEATHER_FAKE_CONTROL_URL;
  if (!url) throw new HttpError(404, "not_found", "No local weather fake is configured.");
  return url;
}

/**
 * Temperature safety: a transfer's verdict, the what-if, the profiles admins keep, and (demo
 * only) the weather fake's scenario. Mounted at the API root; every route names its full path.
 * The ready-to-ship gate and the re-check before departure are the composition root's.
 */
export function temperatureRouter(ctx: AppContext): Router {
  const source = ctx.forecastSource;
  const router = Router();

  /** The transfer's verdict, its readings against the model, and how its box travels. */
  async function presentFor(req: Request, transferId: string) {
    const actor = currentUser(req);
    const { transfer, role } = await loadTransferForActor(req.em, transferId, actor);
    const report = await assessTransferTemperature({ em: req.em, source, transfer, nowMs: Date.now() });
    const [alert, checks, readings, legs, pickedUp] = await Promise.all([
      latestAlert(req.em, transfer.id),
      recentChecks(req.em, transfer.id),
      transferReadings(req.em, transfer.id),
      legsWithCouriers(req.em, transfer.id),
      pickupAt(req.em, transfer.id),
    ]);
    const plan = presentTripPlan(transfer, legs, { actor, role }, pickedUp);
    return presentTransferTemperature(transfer, report, alert, checks, readingsAgainstReport(readings, report), plan);
  }

  router.get("/transfers/:id/temperature", requireUser, async (req: Request, res) => {
    res.json(await presentFor(req, pathId(req, "id", "transfer")));
  });

  router.put("/transfers/:id/temperature/plan", requireUser, async (req: Request, res) => {
    const transferId = pathId(req, "id", "transfer");
    const input = parse(tripPlanInputSchema, req.body);
    await updateTripPlan({ em: req.em, actor: currentUser(req), transferId, input });
    req.em.clear();
    res.json(await presentFor(req, transferId));
  });

  router.put("/transfers/:id/legs/:legId/vehicle", requireUser, async (req: Request, res) => {
    const transferId = pathId(req, "id", "transfer");
    const legId = pathId(req, "legId", "leg");
    const input = parse(legVehicleInputSchema, req.body);
    await declareLegVehicle({ em: req.em, actor: currentUser(req), transferId, legId, input });
    req.em.clear();
    res.json(await presentFor(req, transferId));
  });

  router.get(
    "/temperature/model-accuracy",
    requirePolicy(canReadModelAccuracy, "How the model compares with the readings is for keepers and administrators."),
    async (req, res) => {
      const actor = currentUser(req);
      if (actor.role === "admin") return void res.json(await modelAccuracy(req.em, null));
      const organizationId = actor.organization?.id;
      if (!organizationId) throw new HttpError(403, "forbidden", "Your account belongs to no organisation.");
      res.json(await modelAccuracy(req.em, organizationId));
    },
  );

  router.post(
    "/temperature/assess",
    requirePolicy(canPlanTrips, "Planning a trip is for keepers and administrators."),
    async (req, res) => {
      const input = parse(whatIfInputSchema, req.body);
      const taxon = input.scientificName ? await findTaxonByName(req.em, input.scientificName) : null;
      if (input.scientificName && !taxon) {
        const suggestions = (await searchTaxa(ctx, input.scientificName, 5)).map((t) => t.scientificName);
        throw invalidField(["scientificName"], `“${excerpt(input.scientificName)}” is not in the species list`, {
          suggestions,
        });
      }
      res.json(await assessWhatIf({ em: req.em, source, input, taxon, nowMs: Date.now() }));
    },
  );

  router.get("/temperature/profiles", requireUser, async (req, res) => {
    const [profiles, rows] = await Promise.all([loadProfiles(req.em), loadProfileRows(req.em)]);
    res.json({
      profiles: PROFILE_GROUPS.map((g) => presentProfile(g, profiles[g], rows.get(g))),
      abilities: { edit: canEditTemperatureProfiles(currentUser(req)) },
    });
  });

  router.put(
    "/temperature/profiles/:group",
    requirePolicy(canEditTemperatureProfiles, "Only an administrator can edit temperature profiles."),
    async (req, res) => {
      const group = pathParam(req, "group", "temperature profile", groupParam);
      const data = parse(profileDataSchema, req.body);
      await saveProfile({ em: req.em, actor: currentUser(req), input: { group, data } });
      const em = req.em.fork();
      const [profiles, rows] = await Promise.all([loadProfiles(em), loadProfileRows(em)]);
      res.json({ profile: presentProfile(group, profiles[group], rows.get(group)) });
    },
  );

  router.get("/dev/weather-scenario", requirePolicy(canSwitchWeatherScenario), async (_req, res) => {
    const response = await callWeatherFake(weatherFakeUrl(ctx));
    const body = (await response.json()) as { scenario: string; scenarios: string[] };
    res.json({ scenario: body.scenario, scenarios: body.scenarios });
  });

  router.post("/dev/weather-scenario", requirePolicy(canSwitchWeatherScenario), async (req, res) => {
    const controlUrl = weatherFakeUrl(ctx);
    const { scenario } = parse(scenarioSchema, req.body);
    const response = await callWeatherFake(controlUrl, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ scenario }),
    });
    const body = (await response.json().catch(() => ({}))) as { scenario?: string; reason?: string };
    if (!response.ok)
      throw invalidField(
        ["scenario"],
        "the demo weather stand-in did not take this scenario; choose one from the list",
      );
    // What the cache holds came from the old scenario; the demo should show the new one at once.
    await ctx.pool.query("DELETE FROM forecast_hour");
    res.json({ scenario: body.scenario ?? scenario });
  });

  return router;
}
