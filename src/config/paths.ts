/** Every route path of the client, in one place. */
export const paths = {
  home: "/",
  signIn: "/sign-in",
  welcome: "/welcome",
  admin: {
    users: "/admin/users",
    organizations: "/admin/organizations",
    mail: "/admin/mail",
  },
} as const;
