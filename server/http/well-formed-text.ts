import { isUtf8 } from "node:buffer";
import express, { type RequestHandler } from "express";
import { BROKEN_CHARACTER, NO_CONTROL_CHARACTERS } from "@shared/schemas/common";
import { excerpt, isWellFormedText } from "@shared/validation/text";
import { sentence } from "@shared/validation/messages";
import { HttpError } from "./errors";

/**
 * Only well-formed text gets in (D20 in DEVELOPERS.md). JSON bodies are read as bytes and
 * refused, before anything parses them, when they name a charset other than UTF-8 (415), start
 * with a byte-order mark, or are not valid UTF-8 (400) — body-parser would have decoded them
 * anyway, silently replacing what it could not read. After parsing, a string or key holding a
 * lone surrogate (`"\ud800"`, which JSON's escapes allow) or a NUL is refused, naming the field.
 * The address gets the same treatment: a path or query parameter whose percent-escapes are
 * not UTF-8, or that holds a byte-order mark, is refused before any route reads it.
 */

const BOM = Buffer.from([0xef, 0xbb, 0xbf]);
const UTF8_NAMES = new Set(["utf-8", "utf8"]);

const invalidEncoding = (message: string, field: string) => new HttpError(400, "invalid_encoding", message, { field });

/** The charset a Content-Type header names, lower-case, or null. */
function charsetOf(contentType: string | undefined): string | null {
  const match = /;\s*charset\s*=\s*"?([^";\s]*)"?/i.exec(contentType ?? "");
  return match ? match[1]!.toLowerCase() : null;
}

/** Reads a JSON body as bytes (1 MB at most) and parses it only when it is well-formed UTF-8. */
export function jsonBody(): RequestHandler {
  const raw = express.raw({ type: "application/json", limit: "1mb" });
  return (req, res, next) => {
    if (req.method === "GET" || req.method === "HEAD") return next();
    const charset = charsetOf(req.headers["content-type"]);
    if (charset !== null && req.is("application/json") && !UTF8_NAMES.has(charset)) {
      return next(
        new HttpError(
          415,
          "unsupported_charset",
          `Send the request body as UTF-8 text; this one says its characters are in “${excerpt(charset, 20)}”.`,
        ),
      );
    }
    raw(req, res, (err?: unknown) => {
      if (err) return next(err);
      if (!Buffer.isBuffer(req.body)) return next();
      const bytes: Buffer = req.body;
      if (bytes.length === 0) {
        req.body = {};
        return next();
      }
      if (bytes.subarray(0, 3).equals(BOM))
        return next(
          invalidEncoding(
            "The request body starts with a byte-order mark (U+FEFF). Send the JSON as UTF-8 without one.",
            "body",
          ),
        );
      if (!isUtf8(bytes))
        return next(
          invalidEncoding(
            "The request body is not valid UTF-8 text: some of its bytes do not spell characters. Send it as UTF-8.",
            "body",
          ),
        );
      const text = bytes.toString("utf8");
      // Objects and arrays only, as body-parser's strict mode: a bare value is no request.
      if (!/^[\s]*[[{]/.test(text)) return next(malformedJson());
      try {
        req.body = JSON.parse(text);
      } catch {
        return next(malformedJson());
      }
      const found = findBadText(req.body, []);
      if (found) return next(badTextError(found));
      next();
    });
  };
}

const malformedJson = () => new HttpError(400, "malformed_json", "The request body is not valid JSON.");

type BadText = { path: (string | number)[]; inKey: boolean; problem: "nul" | "surrogate" };

function problemIn(text: string): BadText["problem"] | null {
  if (!isWellFormedText(text)) return "surrogate";
  if (text.includes("\u0000")) return "nul";
  return null;
}

/** The first string or key holding a NUL or a lone surrogate, depth-first. */
function findBadText(value: unknown, path: (string | number)[], depth = 0): BadText | null {
  if (depth > 64) return { path, inKey: false, problem: "nul" };
  if (typeof value === "string") {
    const problem = problemIn(value);
    return problem ? { path, inKey: false, problem } : null;
  }
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const hit = findBadText(value[i], [...path, i], depth + 1);
      if (hit) return hit;
    }
    return null;
  }
  if (value && typeof value === "object") {
    for (const [key, item] of Object.entries(value)) {
      const problem = problemIn(key);
      if (problem) return { path, inKey: true, problem };
      const hit = findBadText(item, [...path, key], depth + 1);
      if (hit) return hit;
    }
  }
  return null;
}

/** "Box 1 label: remove the invisible control characters." — about a key, without echoing it. */
function badTextError({ path, inKey, problem }: BadText): HttpError {
  const instruction = problem === "nul" ? NO_CONTROL_CHARACTERS : BROKEN_CHARACTER;
  const message = inKey ? sentence(path, `${instruction} from the name of a field`) : sentence(path, instruction);
  return new HttpError(400, problem === "nul" ? "invalid" : "invalid_encoding", message, {
    field: path.join(".") || "body",
  });
}

/** The bytes a percent-encoded piece of an address stands for, or null when an escape is malformed. */
function percentDecoded(piece: string): Buffer | null {
  const bytes: number[] = [];
  for (let i = 0; i < piece.length; i++) {
    const code = piece.charCodeAt(i);
    if (code === 0x25 /* % */) {
      const hex = piece.slice(i + 1, i + 3);
      if (!/^[0-9a-f]{2}$/i.test(hex)) return null;
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else if (code < 0x80) {
      bytes.push(code);
    } else {
      // Node hands non-ASCII bytes of the request line over as Latin-1 characters.
      bytes.push(code & 0xff);
    }
  }
  return Buffer.from(bytes);
}

/** Why a piece of the address is not well-formed text, or null when it is. */
function addressProblem(piece: string, plusIsSpace: boolean): "escape" | "utf8" | "bom" | null {
  const bytes = percentDecoded(plusIsSpace ? piece.replace(/\+/g, " ") : piece);
  if (bytes === null) return "escape";
  if (!isUtf8(bytes)) return "utf8";
  if (bytes.includes(BOM)) return "bom";
  return null;
}

const ADDRESS_PROBLEM_WORDS = {
  escape: "has a % that is not followed by two hexadecimal digits",
  utf8: "is not valid UTF-8 text",
  bom: "holds a byte-order mark (U+FEFF)",
} as const;

/**
 * Refuses an address whose path or query parameters are not well-formed UTF-8 text, naming
 * the query parameter (`field`) where it can, before the router decodes anything.
 */
export const wellFormedAddress: RequestHandler = (req, _res, next) => {
  const url = req.originalUrl;
  const question = url.indexOf("?");
  const path = question < 0 ? url : url.slice(0, question);
  // A malformed escape in the query is kept as typed (Node's querystring does), so only the path checks it.
  const pathProblem = addressProblem(path, false);
  if (pathProblem)
    return next(invalidEncoding(`The address is not valid: its path ${ADDRESS_PROBLEM_WORDS[pathProblem]}.`, "path"));
  if (question < 0) return next();
  for (const pair of url.slice(question + 1).split("&")) {
    const equals = pair.indexOf("=");
    const key = equals < 0 ? pair : pair.slice(0, equals);
    const value = equals < 0 ? "" : pair.slice(equals + 1);
    const keyProblem = addressProblem(key, true);
    if (keyProblem && keyProblem !== "escape")
      return next(
        invalidEncoding(
          `The address is not valid: a query parameter's name ${ADDRESS_PROBLEM_WORDS[keyProblem]}.`,
          "query",
        ),
      );
    const valueProblem = addressProblem(value, true);
    if (valueProblem && valueProblem !== "escape") {
      const name = keyProblem ? key : decodeURIComponent(key.replace(/\+/g, " "));
      return next(
        invalidEncoding(
          `The address is not valid: the query parameter “${excerpt(name, 30)}” ${ADDRESS_PROBLEM_WORDS[valueProblem]}.`,
          name,
        ),
      );
    }
  }
  next();
};
