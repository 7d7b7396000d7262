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

export { AuditEvent, Invitation, Lot, Membership, Mold, MoldFile, OutboundMail, PasswordReset, Piece, Pigment, PourPlan, ResinSystem, Session, Shop, User };
export type { MoldStatus, MoldUnits, UpAxis } from './mold.entity';
export type { ResinUse } from './resin-system.entity';
export type { LotPart } from './lot.entity';
export type { Role } from './membership.entity';
export type { PieceStage } from './piece.entity';
export type { OutboundMailStatus } from './outbound-mail.entity';

export const entities = [Shop, User, Membership, Invitation, PasswordReset, Session, Piece, AuditEvent, OutboundMail, Mold, MoldFile, ResinSystem, Pigment, Lot, PourPlan];
