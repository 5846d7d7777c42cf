// The zipcodes package ships no types; this covers what the places module uses.
declare module "zipcodes" {
  export type ZipRecord = {
    zip: string;
    latitude: number;
    longitude: number;
    city: string;
    state: string;
    country: string;
  };
  export function lookup(zip: string | number): ZipRecord | undefined;
  export const codes: Readonly<Record<string, ZipRecord>>;
}
