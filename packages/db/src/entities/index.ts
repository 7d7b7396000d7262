import { AuditEvent } from './audit-event.entity';
import { Invitation } from './invitation.entity';
import { Membership } from './membership.entity';
import { OutboundMail } from './outbound-mail.entity';
import { PasswordReset } from './password-reset.entity';
import { Piece } from './piece.entity';
import { Session } from './session.entity';
import { Shop } from './shop.entity';
import { User } from './user.entity';

export { AuditEvent, Invitation, Membership, OutboundMail, PasswordReset, Piece, Session, Shop, User };
export type { Role } from './membership.entity';
export type { PieceStage } from './piece.entity';
export type { OutboundMailStatus } from './outbound-mail.entity';

export const entities = [Shop, User, Membership, Invitation, PasswordReset, Session, Piece, AuditEvent, OutboundMail];
