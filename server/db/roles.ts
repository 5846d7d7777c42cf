/**
 * The two database roles Hatchway uses (D18 in DEVELOPERS.md). Migrations run as the owner,
 * which owns the schema's objects; the server connects as the app role, which owns nothing and
 * holds only the privileges the migrations grant it: no UPDATE, DELETE or TRUNCATE on the
 * append-only tables, no TRIGGER anywhere, no CREATE in the schema. Neither is a superuser.
 */
export const OWNER_ROLE = "hatchway_owner";
export const APP_ROLE = "hatchway_app";

/** Role attributes both logins are held to: nothing beyond logging in. */
export const ROLE_ATTRIBUTES = "LOGIN NOSUPERUSER NOCREATEDB NOCREATEROLE NOREPLICATION NOBYPASSRLS";
