import { OrganizationSchema } from "./organization.entity";
import { OutboxMessageSchema } from "./outbox-message.entity";
import { PasswordTokenSchema } from "./password-token.entity";
import { UserSchema } from "./user.entity";
import { TaxonNameSchema, TaxonSchema } from "./taxon.entity";
import {
  AnimalSchema,
  ContainerSchema,
  LegSchema,
  MessageSchema,
  TransferChangeSchema,
  TransferSchema,
} from "./transfer.entity";
import { CustodyEntrySchema } from "./custody-entry.entity";
import { TransferAlertSchema } from "./transfer-alert.entity";
import { DeliveryCodeSchema, TransferPhotoSchema } from "./custody-evidence.entity";
import {
  CheckInExtraSchema,
  CheckInItemSchema,
  CheckInSchema,
  RegisterEntrySchema,
  RegisterEventSchema,
} from "./check-in.entity";
import { IdempotencyKeySchema } from "./idempotency-key.entity";
import { RunSchema, RunStopSchema } from "./run.entity";
import {
  ComplianceEvaluationSchema,
  ComplianceOverrideSchema,
  ComplianceRuleSchema,
  DocumentScanSchema,
  JurisdictionCoverageSchema,
  PermitDocumentSchema,
  TransferDocumentSchema,
} from "./compliance.entity";
import {
  ForecastHourSchema,
  TemperatureAlertSchema,
  TemperatureCheckSchema,
  TemperatureProfileSchema,
} from "./temperature.entity";

export {
  OrganizationSchema,
  OutboxMessageSchema,
  PasswordTokenSchema,
  UserSchema,
  TaxonSchema,
  TaxonNameSchema,
  TransferSchema,
  ContainerSchema,
  AnimalSchema,
  LegSchema,
  MessageSchema,
  TransferChangeSchema,
  CustodyEntrySchema,
  TransferAlertSchema,
  CheckInSchema,
  CheckInItemSchema,
  CheckInExtraSchema,
  RegisterEntrySchema,
  RegisterEventSchema,
  IdempotencyKeySchema,
  TransferPhotoSchema,
  DeliveryCodeSchema,
};

/** Every entity the ORM knows; new entities are added here once. */
export const ENTITIES = [
  OrganizationSchema,
  UserSchema,
  PasswordTokenSchema,
  OutboxMessageSchema,
  TaxonSchema,
  TaxonNameSchema,
  TransferSchema,
  ContainerSchema,
  AnimalSchema,
  LegSchema,
  MessageSchema,
  TransferChangeSchema,
  CustodyEntrySchema,
  TransferAlertSchema,
  CheckInSchema,
  CheckInItemSchema,
  CheckInExtraSchema,
  RegisterEntrySchema,
  RegisterEventSchema,
  IdempotencyKeySchema,
  ComplianceRuleSchema,
  PermitDocumentSchema,
  DocumentScanSchema,
  TransferDocumentSchema,
  ComplianceEvaluationSchema,
  ComplianceOverrideSchema,
  JurisdictionCoverageSchema,
  ForecastHourSchema,
  TemperatureProfileSchema,
  TemperatureCheckSchema,
  TemperatureAlertSchema,
  TransferPhotoSchema,
  DeliveryCodeSchema,
  RunSchema,
  RunStopSchema,
];
