import { TEMPERATURE_VERDICT_WORDS } from "@shared/words";
import { blocksShipping } from "@shared/temperature/report";
import { conflict, invalidField } from "../../http/errors";
import { appendCustody } from "../transfers/custody";
import { overrides, type ReadyGate } from "../transfers/transition";
import { recordCheck } from "./checks";
import type { WeatherSource } from "./forecasts";
import { assessTransferTemperature } from "./transfer-temperature";

/**
 * Ready-to-ship gate: assesses the transfer as it stands with the app's weather source and keeps
 * the check. "Do not ship" and "forecast unavailable" block unless the confirming party overrides
 * with a reason, which goes into the custody log with the verdict. With no source the gate has no
 * forecast and blocks (never a silent "safe"). The temperature check is a planning aid, not law.
 */
export function createTemperatureGate(source: WeatherSource | null): ReadyGate {
  return Object.freeze({
    name: "temperature",
    async check({ em, actor, transfer, input }) {
      const now = new Date();
      const report = await assessTransferTemperature({ em, source, transfer, nowMs: now.getTime() });
      recordCheck(em, transfer, "gate", report, now);
      if (!blocksShipping(report.verdict)) return;
      if (!overrides(input, "temperature")) {
        throw conflict(
          `Temperature check: ${TEMPERATURE_VERDICT_WORDS[report.verdict].toLowerCase()}. ${report.advice.message} To clear the transfer anyway, confirm with an override and a reason; it goes into the custody log.`,
          { temperature: report },
        );
      }
      if (!input.reason)
        throw invalidField(
          ["reason"],
          "say why the animals should travel despite the temperature check; it goes into the custody log",
        );
      await appendCustody(em, transfer.id, actor, "override", {
        gate: "temperature",
        verdict: report.verdict,
        advice: report.advice.code,
        reason: input.reason,
      });
    },
  });
}
