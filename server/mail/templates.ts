import type { OutgoingMail } from './mailer';

const footer = '\n\n— Frostgrade, graded-leg cooler design\nYou receive this because of an action in your team\'s Frostgrade workspace.';

export function invitationMail(to: string, o: { teamName: string; inviter: string; role: string; link: string; expiresAt: Date }): OutgoingMail {
  return {
    to: [to],
    subject: `${o.inviter} invites you to ${o.teamName} on Frostgrade`,
    text: `${o.inviter} invites you to join ${o.teamName} on Frostgrade as ${o.role}.\n\nAccept the invitation and choose your password here (single use, valid until ${o.expiresAt.toUTCString()}):\n${o.link}${footer}`,
  };
}

export function resetMail(to: string, o: { link: string; expiresAt: Date }): OutgoingMail {
  return {
    to: [to],
    subject: 'Reset your Frostgrade password',
    text: `Someone (hopefully you) asked to reset the password of this Frostgrade account.\n\nChoose a new password here (single use, valid until ${o.expiresAt.toUTCString()}):\n${o.link}\n\nIf it was not you, ignore this message: your password stays as it is.${footer}`,
  };
}
