/** A route with a parameter: the pattern for the router, and a link builder. */
const withTransferId = (suffix: string) => ({
  pattern: `/transfers/:transferId${suffix}`,
  href: (transferId: string) => `/transfers/${encodeURIComponent(transferId)}${suffix}`,
});

/** Every route path of the client, in one place. */
export const paths = {
  /** Members and admins: the transfers list; couriers: their legs. */
  home: "/",
  signIn: "/sign-in",
  welcome: "/welcome",
  signUp: "/sign-up",
  signUpConfirm: "/sign-up/confirm",
  forgotPassword: "/forgot-password",
  resetPassword: "/reset-password",
  join: "/join",
  account: "/account",
  organizationMembers: "/organization/people",
  transfers: {
    new: "/transfers/new",
    detail: withTransferId(""),
    edit: withTransferId("/edit"),
    custody: withTransferId("/custody"),
    checkIn: withTransferId("/check-in"),
  },
  courier: {
    /** The handoff page a box label's QR code opens. */
    handoff: {
      pattern: "/legs/:transferId",
      href: (transferId: string) => `/legs/${encodeURIComponent(transferId)}`,
    },
  },
  /** A courier service's runs (its manager plans them, its couriers read them). */
  runs: "/runs",
  runNew: "/runs/new",
  run: {
    pattern: "/runs/:runId",
    href: (runId: string) => `/runs/${encodeURIComponent(runId)}`,
  },
  register: "/register",
  registerEntry: {
    pattern: "/register/entries/:entryId",
    href: (entryId: string) => `/register/entries/${encodeURIComponent(entryId)}`,
  },
  registerAdd: "/register/add",
  registerImport: "/register/import",
  registerReport: "/register/report",
  registerSettings: "/register/settings",
  /** The organisation's permits and certificates (the expiry e-mail links here). */
  permits: "/permits",
  canItTravel: "/can-it-travel",
  planTrip: "/plan-trip",
  /** How far the model has been from the box readings across the organisation's transfers. */
  modelAccuracy: "/model-accuracy",
  admin: {
    users: "/admin/users",
    organizations: "/admin/organizations",
    mail: "/admin/mail",
    rules: "/admin/rules",
    temperatureProfiles: "/admin/temperature-profiles",
  },
} as const;
