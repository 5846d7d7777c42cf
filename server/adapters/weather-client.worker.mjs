/* global AbortSignal, Response */
// Runs the openmeteo client for server/adapters/weather.ts, in a thread of its own for two
// reasons. (1) The client parses any 2xx-or-other body as size-prefixed FlatBuffers and its
// frame loop never ends on a frame length of −4 or less: garbage bytes do that half the time,
// and the runaway allocation kills the whole process (measured; a worker heap limit does not
// stop it). This thread's own `fetch` is wrapped so that the client only ever sees a body whose
// frames exactly tile it; patching the global is safe here because nothing else runs in it.
// (2) The adapter can terminate the thread when the time is up, whatever it is doing.
// The decoded fields are copied into plain data; all checking of values happens in weather.ts.
import { parentPort, workerData } from "node:worker_threads";
import { fetchWeatherApi } from "openmeteo";

const { url, params, timeoutMs, retries, maxLocations, maxValues, maxBodyBytes } = workerData;
// At most a few variables are asked for; a garbage vector length must not drive a loop.
const MAX_VARIABLES = 8;
// Statuses the client itself handles: retries 500/502/504, reads the JSON reason of 400/429.
const CLIENT_HANDLED = new Set([400, 429, 500, 502, 504]);
// The smallest table a frame can hold: a root offset and a vtable offset.
const MIN_FRAME_BYTES = 8;

class CheckedFetchError extends Error {
  constructor(name, message) {
    super(message);
    this.name = name;
  }
}

async function readCapped(response) {
  const declared = Number(response.headers.get("content-length") ?? 0);
  if (declared > maxBodyBytes) throw new CheckedFetchError("InvalidBody", `body of ${declared} bytes`);
  const chunks = [];
  let size = 0;
  for await (const chunk of response.body ?? []) {
    size += chunk.length;
    if (size > maxBodyBytes) throw new CheckedFetchError("InvalidBody", `body over ${maxBodyBytes} bytes`);
    chunks.push(chunk);
  }
  const bytes = new Uint8Array(size);
  let offset = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, offset);
    offset += chunk.length;
  }
  return bytes;
}

function framingProblem(bytes) {
  if (bytes.length === 0) return "empty body";
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  for (let pos = 0; pos < bytes.length;) {
    if (pos + 4 > bytes.length) return `truncated size prefix at byte ${pos}`;
    const length = view.getInt32(pos, true);
    if (length < MIN_FRAME_BYTES || pos + 4 + length > bytes.length) return `frame length ${length} at byte ${pos}`;
    pos += 4 + length;
  }
  return null;
}

const plainFetch = globalThis.fetch;
globalThis.fetch = async (input, init) => {
  const response = await plainFetch(input, init);
  if (CLIENT_HANDLED.has(response.status)) return response;
  if (!response.ok)
    throw new CheckedFetchError("UpstreamStatus", `HTTP ${response.status} ${response.statusText}`.trim());
  const bytes = await readCapped(response);
  const problem = framingProblem(bytes);
  if (problem) throw new CheckedFetchError("InvalidBody", `not FlatBuffers frames: ${problem}`);
  return new Response(bytes, { status: response.status, headers: response.headers });
};

function plainError(error) {
  const cause = error && error.cause;
  return {
    name: String((error && error.name) || "Error"),
    message: String((error && error.message) || error),
    cause: cause ? String(cause.code || cause.message || cause) : "",
  };
}

function readVariable(variable) {
  const length = variable.valuesLength();
  const values = length <= maxValues ? Array.from({ length }, (_, i) => variable.values(i)) : [];
  return { variable: variable.variable(), unit: variable.unit(), altitude: variable.altitude(), length, values };
}

function readLocation(response) {
  const hourly = response.hourly();
  const variables = [];
  if (hourly) {
    const count = Math.min(hourly.variablesLength(), MAX_VARIABLES);
    for (let v = 0; v < count; v++) variables.push(readVariable(hourly.variables(v)));
  }
  return {
    latitude: response.latitude(),
    longitude: response.longitude(),
    hourly: hourly && {
      time: Number(hourly.time()),
      timeEnd: Number(hourly.timeEnd()),
      interval: hourly.interval(),
      variables,
    },
  };
}

let responses;
try {
  responses = await fetchWeatherApi(url, params, retries, 0.2, 1, {
    redirect: "error",
    signal: AbortSignal.timeout(timeoutMs),
  });
} catch (error) {
  parentPort.postMessage({ ok: false, phase: "fetch", error: plainError(error) });
}
if (responses) {
  try {
    if (responses.length > maxLocations) throw new Error(`${responses.length} locations in the answer`);
    parentPort.postMessage({ ok: true, locations: responses.map(readLocation) });
  } catch (error) {
    parentPort.postMessage({ ok: false, phase: "decode", error: plainError(error) });
  }
}
