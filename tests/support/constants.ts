/** Ports and names the test set-up shares with the workers. */
export const TEST_PG_PORT = Number(process.env.HATCHWAY_TEST_PG_PORT ?? 54329);
export const TEMPLATE_DB = "hatchway_template";
export const OUTPUT_DIR = new URL("../../test-output/", import.meta.url).pathname;
