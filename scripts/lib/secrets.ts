import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { PROJECT_ROOT } from "./postgres";

/** A per-checkout random secret kept in the ignored .data folder, so sessions survive restarts. */
export function localSecret(name: string): string {
  const dir = path.join(PROJECT_ROOT, ".data");
  mkdirSync(dir, { recursive: true });
  const file = path.join(dir, `${name}.secret`);
  if (existsSync(file)) return readFileSync(file, "utf8").trim();
  const secret = randomBytes(48).toString("base64url");
  writeFileSync(file, secret + "\n", { mode: 0o600 });
  return secret;
}
