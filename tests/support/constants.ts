/** Ports and names the test set-up shares with the workers. */
export const TEST_PG_PORT = Number(process.env.HATCHWAY_TEST_PG_PORT ?? 54329);
export const TEMPLATE_DB = "hatchway_template";
export const OUTPUT_DIR = new URL("../../test-output/", import.meta.url).pathname;
/** The public URL test apps are built with (links in their e-mails and on their manifests). */
export const TEST_PUBLIC_URL = "http://127.0.0.1:3999";
