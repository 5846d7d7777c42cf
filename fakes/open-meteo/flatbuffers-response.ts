/**
 * Builds Open-Meteo `WeatherApiResponse` messages with flatbuffers' generic Builder: the
 * @openmeteo/sdk package has reader classes only. Field slots follow the generated readers
 * (vtable offset 4 + 2·slot): WeatherApiResponse latitude 0, longitude 1, elevation 2,
 * generationTimeMilliseconds 3, locationId 4, model 5, utcOffsetSeconds 6, timezone 7,
 * timezoneAbbreviation 8, hourly 11 (15 fields); VariablesWithTime time 0, timeEnd 1,
 * interval 2, variables 3 (4 fields); VariableWithValues variable 0, unit 1, values 3,
 * altitude 5 (13 fields).
 */
import { Builder } from "flatbuffers";
import { Model } from "@openmeteo/sdk/model.js";

export type VariableSeries = { variable: number; unit: number; altitude: number; values: readonly number[] };

export type LocationResponse = {
  latitude: number;
  longitude: number;
  elevation: number;
  locationId: number;
  utcOffsetSeconds: number;
  timezone: string;
  timezoneAbbreviation: string;
  hourly: { timeS: number; timeEndS: number; intervalS: number; variables: readonly VariableSeries[] };
};

const RESPONSE_FIELDS = 15;
const VARIABLES_WITH_TIME_FIELDS = 4;
const VARIABLE_WITH_VALUES_FIELDS = 13;

function addVariable(builder: Builder, series: VariableSeries): number {
  builder.startVector(4, series.values.length, 4);
  for (let i = series.values.length - 1; i >= 0; i--) builder.addFloat32(series.values[i]!);
  const values = builder.endVector();
  builder.startObject(VARIABLE_WITH_VALUES_FIELDS);
  builder.addFieldInt8(0, series.variable, 0);
  builder.addFieldInt8(1, series.unit, 0);
  builder.addFieldOffset(3, values, 0);
  builder.addFieldInt16(5, series.altitude, 0);
  return builder.endObject();
}

function addHourly(builder: Builder, hourly: LocationResponse["hourly"]): number {
  const variables = hourly.variables.map((v) => addVariable(builder, v));
  builder.startVector(4, variables.length, 4);
  for (let i = variables.length - 1; i >= 0; i--) builder.addOffset(variables[i]!);
  const vector = builder.endVector();
  builder.startObject(VARIABLES_WITH_TIME_FIELDS);
  builder.addFieldInt64(0, BigInt(hourly.timeS), BigInt(0));
  builder.addFieldInt64(1, BigInt(hourly.timeEndS), BigInt(0));
  builder.addFieldInt32(2, hourly.intervalS, 0);
  builder.addFieldOffset(3, vector, 0);
  return builder.endObject();
}

/** One size-prefixed WeatherApiResponse, as the service sends per location. */
export function encodeLocation(location: LocationResponse): Uint8Array {
  const builder = new Builder(1024);
  const timezone = builder.createString(location.timezone);
  const abbreviation = builder.createString(location.timezoneAbbreviation);
  const hourly = addHourly(builder, location.hourly);
  builder.startObject(RESPONSE_FIELDS);
  builder.addFieldFloat32(0, location.latitude, 0);
  builder.addFieldFloat32(1, location.longitude, 0);
  builder.addFieldFloat32(2, location.elevation, 0);
  builder.addFieldFloat32(3, 0.5, 0);
  builder.addFieldInt64(4, BigInt(location.locationId), BigInt(0));
  builder.addFieldInt8(5, Model.best_match, 0);
  builder.addFieldInt32(6, location.utcOffsetSeconds, 0);
  builder.addFieldOffset(7, timezone, 0);
  builder.addFieldOffset(8, abbreviation, 0);
  builder.addFieldOffset(11, hourly, 0);
  builder.finishSizePrefixed(builder.endObject());
  return builder.asUint8Array().slice();
}

/** The body of a multi-location answer: the size-prefixed messages back to back. */
export function encodeResponse(locations: readonly LocationResponse[]): Uint8Array {
  const parts = locations.map(encodeLocation);
  const body = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let offset = 0;
  for (const part of parts) {
    body.set(part, offset);
    offset += part.length;
  }
  return body;
}
