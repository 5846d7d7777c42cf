import { MAIL_CHOICES, ORGANIZATION_KINDS } from "../constants";
import { instruction } from "../validation/messages";
import { z } from "../validation/zod";
import {
  emailSchema,
  idSchema,
  passwordSchema,
  phoneSchema,
  requiredText,
  text,
  usStateSchema,
  zipSchema,
} from "./common";

/** A one-time link's token as it arrives from the e-mail (the server only keeps its SHA-256). */
export const linkTokenSchema = text(200).pipe(
  z.string().min(20, { error: instruction("this link is not whole; open the link from the e-mail again") }),
);

/** The organisation a sign-up creates: the public contract of POST /api/signup (issue 14, §1). */
export const signupOrganizationSchema = z.strictObject({
  name: requiredText(200),
  kind: z.enum(ORGANIZATION_KINDS),
  street: requiredText(200),
  city: requiredText(100),
  state: usStateSchema,
  zip: zipSchema,
  phone: phoneSchema,
  email: emailSchema,
});

/** Its first person, who becomes its manager. */
export const signupUserSchema = z.strictObject({
  email: emailSchema,
  displayName: requiredText(120),
  password: passwordSchema,
});

export const signupSchema = z.strictObject({
  organization: signupOrganizationSchema,
  user: signupUserSchema,
  /** The token of an invitation e-mail: sign up into the organisation that was invited. */
  invitation: linkTokenSchema.optional(),
});
export type SignupInput = z.infer<typeof signupSchema>;

export const confirmSignupSchema = z.strictObject({ token: linkTokenSchema });

export const passwordResetRequestSchema = z.strictObject({ email: emailSchema });

/** The sign-up form: the same fields, and the password typed twice (only the first goes to the server). */
export const signupFormSchema = z
  .strictObject({
    organization: signupOrganizationSchema,
    user: signupUserSchema.extend({ confirm: z.string() }),
  })
  .refine((v) => v.user.password === v.user.confirm, {
    path: ["user", "confirm"],
    params: { instruction: "the two passwords differ; type the same one again" },
  });
export type SignupForm = z.infer<typeof signupFormSchema>;

/** The one answer to a sign-up and to a reset request, whatever the address. */
export type CheckYourEmailDto = { status: "check_your_email" };

/** The account page: one's own name and which e-mails to receive (issue 14, §2). */
export const accountPatchSchema = z.strictObject({
  displayName: requiredText(120).optional(),
  /** For each choice, whether to receive it. Alerts that carry safety information are not choices. */
  mail: z.partialRecord(z.enum(MAIL_CHOICES), z.boolean()).optional(),
});
export type AccountPatchInput = z.infer<typeof accountPatchSchema>;

/** Changing one's password asks for the current one. */
export const passwordChangeSchema = z.strictObject({
  currentPassword: z.string().max(1024),
  newPassword: passwordSchema,
});

export type AccountDto = {
  id: string;
  email: string;
  displayName: string;
  role: string;
  organization: { id: string; name: string; kind: string } | null;
  mail: Record<(typeof MAIL_CHOICES)[number], boolean>;
};

/** A sender invites the other party of a transfer by e-mail (issue 14, §3): a public contract. */
export const organizationInvitationSchema = z.strictObject({
  organizationName: requiredText(200),
  kind: z.enum(ORGANIZATION_KINDS),
  email: emailSchema,
  state: usStateSchema,
});
export type OrganizationInvitationInput = z.infer<typeof organizationInvitationSchema>;

/** What the sign-up page shows about the invitation it was opened from. */
export type InvitationDto = {
  organization: { name: string; kind: (typeof ORGANIZATION_KINDS)[number]; state: string };
  invitedBy: { displayName: string; organizationName: string | null };
};

/** The sender chooses the courier service that carries a transfer (null: none). */
export const courierServiceChoiceSchema = z.strictObject({ organizationId: idSchema.nullable() });
