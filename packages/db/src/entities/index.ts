import { AuditEvent } from './audit-event.entity';
import { Invitation } from './invitation.entity';
import { Membership } from './membership.entity';
import { OutboundMail } from './outbound-mail.entity';
import { PasswordReset } from './password-reset.entity';
import { Piece } from './piece.entity';
import { Session } from './session.entity';
import { Shop } from './shop.entity';
import { User } from './user.entity';
import { Mold } from './mold.entity';
import { MoldFile } from './mold-file.entity';
import { ResinSystem } from './resin-system.entity';
import { Pigment } from './pigment.entity';
import { Lot } from './lot.entity';
import { PourPlan } from './pour-plan.entity';
import { Pour } from './pour.entity';
import { PourBatch } from './pour-batch.entity';
import { TemperatureReading } from './temperature-reading.entity';
import { CureCheck } from './cure-check.entity';
import { Reminder } from './reminder.entity';
import { RateLimitCounter } from './rate-limit-counter.entity';
import { IdempotencyKey } from './idempotency-key.entity';

export {
  AuditEvent,
  CureCheck,
  IdempotencyKey,
  Invitation,
  Lot,
  Pour,
  PourBatch,
  Reminder,
  TemperatureReading,
  Membership,
  Mold,
  MoldFile,
  OutboundMail,
  PasswordReset,
  Piece,
  Pigment,
  PourPlan,
  RateLimitCounter,
  ResinSystem,
  Session,
  Shop,
  User,
};
export type { MoldFormat, MoldStatus, MoldUnits, UpAxis } from './mold.entity';
export type { ResinUse } from './resin-system.entity';
export type { LotPart } from './lot.entity';
export type { PourStatus } from './pour.entity';
export type { CureCheckStage } from './cure-check.entity';
export type { ReminderKind } from './reminder.entity';
export type { Role } from './membership.entity';
export type { PieceStage } from './piece.entity';
export type { OutboundMailStatus } from './outbound-mail.entity';
export type { ShopTemperatureProfile } from './shop.entity';

export const entities = [
  Shop,
  User,
  Membership,
  Invitation,
  PasswordReset,
  Session,
  Piece,
  AuditEvent,
  OutboundMail,
  Mold,
  MoldFile,
  ResinSystem,
  Pigment,
  Lot,
  PourPlan,
  Pour,
  PourBatch,
  TemperatureReading,
  CureCheck,
  Reminder,
  RateLimitCounter,
  IdempotencyKey,
];
