import { z } from 'zod';
import { Email, Id, Password, Role, Timestamp, requiredText } from './common';
import { Shop, TimeZone } from './shop';

export const User = z.object({ id: Id, email: z.string(), name: z.string() });
export type User = z.infer<typeof User>;

export const ShopMembershipSummary = z.object({ shopId: Id, shopName: z.string(), role: Role });
export type ShopMembershipSummary = z.infer<typeof ShopMembershipSummary>;

export const RegisterRequest = z.object({
  shopName: requiredText(120, 'shop name'),
  name: requiredText(120, 'your name'),
  email: Email,
  password: Password,
  timeZone: TimeZone.optional().describe("the shop's IANA zone, taken from the browser at sign-up (UTC when not given)"),
});
export type RegisterRequest = z.infer<typeof RegisterRequest>;

export const LoginRequest = z.object({
  email: Email,
  password: z.string({ message: 'password must be text' }).min(1, { message: 'password is required' }).max(200),
  shopId: Id.optional(),
});
export type LoginRequest = z.infer<typeof LoginRequest>;

export const SessionResponse = z.object({
  token: z.string().describe('send as Authorization: Bearer <token>; the web app also gets it as an HttpOnly cookie'),
  expiresAt: Timestamp,
  user: User,
  shop: Shop,
  role: Role,
});
export type SessionResponse = z.infer<typeof SessionResponse>;

export const MeResponse = z.object({
  user: User,
  shop: Shop,
  role: Role,
  shops: z.array(ShopMembershipSummary),
  calendarUrl: z
    .string()
    .describe("the member's private calendar feed (text/calendar) of the shop's coming pour steps; POST /api/me/calendar/rotate replaces it"),
});
export type MeResponse = z.infer<typeof MeResponse>;

export const SwitchShopRequest = z.object({ shopId: Id });
export type SwitchShopRequest = z.infer<typeof SwitchShopRequest>;

export const PasswordResetRequest = z.object({ email: Email });
export type PasswordResetRequest = z.infer<typeof PasswordResetRequest>;

export const ResetToken = z
  .string({ message: 'token must be text' })
  .regex(/^[A-Za-z0-9_-]{20,200}$/, { message: 'the link is not complete; open it again from the e-mail' });

export const PasswordResetConfirm = z.object({ token: ResetToken, password: Password });
export type PasswordResetConfirm = z.infer<typeof PasswordResetConfirm>;

export const Accepted = z.object({ message: z.string() });
