import { OrganizationSchema } from "./organization.entity";
import { OutboxMessageSchema } from "./outbox-message.entity";
import { PasswordTokenSchema } from "./password-token.entity";
import { UserSchema } from "./user.entity";

export { OrganizationSchema, OutboxMessageSchema, PasswordTokenSchema, UserSchema };

/** Every entity the ORM knows; new entities are added here once. */
export const ENTITIES = [OrganizationSchema, UserSchema, PasswordTokenSchema, OutboxMessageSchema];
