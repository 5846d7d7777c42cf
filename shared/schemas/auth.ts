import { ORGANIZATION_KINDS, USER_ROLES } from "../constants";
import { instruction } from "../validation/messages";
import { z } from "../validation/zod";
import { linkTokenSchema } from "./account";
import { addressSchema, emailSchema, idSchema, passwordSchema, phoneSchema, requiredText, text } from "./common";

export const loginSchema = z.strictObject({
  email: text(254),
  password: z.string().max(1024),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const setPasswordSchema = z.strictObject({
  token: text(200).pipe(
    z.string().min(20, { error: instruction("this link is not whole; open the link from the e-mail again") }),
  ),
  password: passwordSchema,
});
export type SetPasswordInput = z.infer<typeof setPasswordSchema>;

/** The welcome form: a new password, typed twice (only the first goes to the server). */
export const passwordChoiceSchema = z
  .strictObject({ password: passwordSchema, confirm: z.string() })
  .refine((v) => v.password === v.confirm, {
    path: ["confirm"],
    params: { instruction: "the two passwords differ; type the same one again" },
  });
export type PasswordChoice = z.infer<typeof passwordChoiceSchema>;

export const organizationInputSchema = z.strictObject({
  name: requiredText(200),
  kind: z.enum(ORGANIZATION_KINDS),
  address: addressSchema,
  phone: phoneSchema,
  email: emailSchema,
});
export type OrganizationInput = z.infer<typeof organizationInputSchema>;

export const organizationPatchSchema = organizationInputSchema.extend({ listed: z.boolean() }).partial().strict();
export type OrganizationPatch = z.infer<typeof organizationPatchSchema>;

export const userInviteSchema = z.strictObject({
  email: emailSchema,
  displayName: requiredText(120),
  role: z.enum(USER_ROLES),
  organizationId: idSchema.nullable(),
});
export type UserInviteInput = z.infer<typeof userInviteSchema>;

export const userPatchSchema = z.strictObject({
  displayName: requiredText(120).optional(),
  role: z.enum(USER_ROLES).optional(),
  organizationId: idSchema.nullable().optional(),
  disabled: z.boolean().optional(),
});
export type UserPatch = z.infer<typeof userPatchSchema>;

/** What the API says about an organisation. */
export type OrganizationDto = {
  id: string;
  name: string;
  kind: (typeof ORGANIZATION_KINDS)[number];
  address: z.infer<typeof addressSchema>;
  phone: string;
  email: string;
  /** Invited and nobody signed up yet (issue 14, §3). */
  pending: boolean;
  /** Shown in the directory (name, kind, city and state only). */
  listed: boolean;
};

/** The signed-in user as the API presents them. */
export type UserDto = {
  id: string;
  email: string;
  displayName: string;
  role: (typeof USER_ROLES)[number];
  organization: { id: string; name: string; kind: string } | null;
};

export type AdminUserDto = UserDto & { disabled: boolean; invitationPending: boolean; createdAt: string };

/** The roles a manager hands out within an organisation: never the site administrator's. */
export const ORGANIZATION_ROLES = ["manager", "member", "courier"] as const;

/** A manager invites a person to the organisation (issue 14, §2). */
export const memberInviteSchema = z.strictObject({
  email: emailSchema,
  displayName: requiredText(120),
  role: z.enum(ORGANIZATION_ROLES),
});
export type MemberInviteInput = z.infer<typeof memberInviteSchema>;

/** A manager changes a person's role, or disables (or enables) them: one change at a time. */
export const memberPatchSchema = z.union([
  z.strictObject({ role: z.enum(ORGANIZATION_ROLES) }),
  z.strictObject({ disabled: z.boolean() }),
]);
export type MemberPatchInput = z.infer<typeof memberPatchSchema>;

/** Accepting, from an e-mail link, to join an organisation with an account one already has. */
export const joinOrganizationSchema = z.strictObject({ token: linkTokenSchema });

/** A person of an organisation as its manager sees them. */
export type MemberDto = AdminUserDto;
