import { shopTimeWords } from '@gelpoint/core';

// Plain-text mail: it reads well in every client and carries the one link that matters. Times are the shop's own.

const footer =
  '\n\n— Gelpoint, the pour planner and cure log of your shop\nYou get this because someone used your address in Gelpoint. If that was not you, ignore this message.';

export function invitationMail(p: { shopName: string; inviterName: string; role: string; link: string; expiresAt: Date; timeZone: string }) {
  return {
    subject: `${p.inviterName} invited you to ${p.shopName} on Gelpoint`,
    text:
      `${p.inviterName} invited you to join ${p.shopName} on Gelpoint as ${p.role}.\n\n` +
      `Accept the invitation here (the link works once and expires ${shopTimeWords(p.expiresAt.getTime(), p.timeZone)}):\n${p.link}` +
      footer,
  };
}

export function passwordResetMail(p: { name: string; link: string; minutes: number }) {
  return {
    subject: 'Reset your Gelpoint password',
    text:
      `Hello ${p.name},\n\nSomeone (hopefully you) asked to reset your Gelpoint password. ` +
      `Choose a new one here; the link works once and expires in ${p.minutes} minutes:\n${p.link}\n\n` +
      'If you did not ask, you can ignore this message; your password stays as it is.' +
      footer,
  };
}
