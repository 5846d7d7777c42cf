/**
 * zod as every schema in shared/ uses it: with our error map installed, so that any issue a
 * schema has no message for is told in a keeper's words (see ./messages.ts), on the server, in
 * the forms and in any test that parses directly. Import `z` from here, never from "zod", in
 * shared/ (lint enforces it); types may come from "zod".
 */
import { z } from "zod";
import { keeperErrorMap } from "./messages";

z.config({ customError: keeperErrorMap });

export { z };
