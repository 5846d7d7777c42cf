// The zipcodes package ships no types; this covers the one call the places module makes.
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
}
