import type { OutgoingMail } from './mailer';

const footer = '\n\n— Frostgrade, graded-leg cooler design\nYou receive this because of an action in your team\'s Frostgrade workspace.';
/** Mail to an address that asked for nothing itself (someone typed it into a form). */
const strangerFooter = '\n\n— Frostgrade, graded-leg cooler design\nYou receive this because someone entered this address on Frostgrade. If it was not you, ignore this message: nothing changes.';

const until = (d: Date): string => d.toUTCString();

/**
 * Subjects carry no words a requester chose (team or person names), so a
 * form cannot be used to send strangers a subject line of someone's choosing.
 */
export function invitationMail(to: string, o: { teamName: string; inviter: string; role: string; link: string; expiresAt: Date }): OutgoingMail {
  return {
    to: [to],
    subject: 'You are invited to join a team on Frostgrade',
    text: `${o.inviter} invites you to join ${o.teamName} on Frostgrade as ${o.role}.\n\nAccept the invitation and choose your password here (single use, valid until ${until(o.expiresAt)}):\n${o.link}${strangerFooter}`,
  };
}

/** An invitation to an address that already has an account: one account belongs to one team. */
export function invitationTakenMail(to: string, o: { teamName: string; inviter: string; sameTeam: boolean; signIn: string }): OutgoingMail {
  const why = o.sameTeam
    ? `Your account is already a member of ${o.teamName}: sign in as usual.`
    : `Your Frostgrade account belongs to another team, and an account belongs to exactly one team, so it cannot join ${o.teamName}. To join, ask ${o.inviter} to invite a different address of yours.`;
  return {
    to: [to],
    subject: 'You are invited to join a team on Frostgrade',
    text: `${o.inviter} invited this address to join ${o.teamName} on Frostgrade.\n\n${why}\n\nSign in: ${o.signIn}${strangerFooter}`,
  };
}

export function signUpLinkMail(to: string, o: { teamName: string; link: string; expiresAt: Date }): OutgoingMail {
  return {
    to: [to],
    subject: 'Finish creating your Frostgrade account',
    text: `Someone (hopefully you) asked to start a team called ${o.teamName} on Frostgrade with this address.\n\nChoose your password here to create the team and your account (single use, valid until ${until(o.expiresAt)}):\n${o.link}${strangerFooter}`,
  };
}

/** Sign-up with an address that has an account: its owner hears of it, the requester learns nothing. */
export function signUpTakenMail(to: string, o: { signIn: string; reset: string }): OutgoingMail {
  return {
    to: [to],
    subject: 'Someone tried to create a Frostgrade account with your address',
    text: `Someone (perhaps you) tried to create a new Frostgrade account with this address, which already has one. No new account was made.\n\nSign in: ${o.signIn}\nForgot your password? Reset it: ${o.reset}\n\nIf it was not you, nothing needs doing: your account is unchanged.${footer}`,
  };
}

export function resetMail(to: string, o: { link: string; expiresAt: Date }): OutgoingMail {
  return {
    to: [to],
    subject: 'Reset your Frostgrade password',
    text: `Someone (hopefully you) asked to reset the password of this Frostgrade account.\n\nChoose a new password here (single use, valid until ${until(o.expiresAt)}):\n${o.link}\n\nIf it was not you, ignore this message: your password stays as it is.${footer}`,
  };
}

export function passwordChangedMail(to: string, o: { how: 'changed' | 'reset'; reset: string }): OutgoingMail {
  const what = o.how === 'changed' ? 'changed while signed in' : 'reset through an e-mailed link';
  return {
    to: [to],
    subject: 'Your Frostgrade password was changed',
    text: `The password of your Frostgrade account was just ${what}; every other session of the account was signed out.\n\nIf it was not you, reset your password now and tell your team's admin: ${o.reset}${footer}`,
  };
}

/**
 * The physicist's verdict on a growth order, to the team's growers. Members
 * only (the team's own words may go in the subject): the batch names the order.
 */
export function orderClosedMail(to: string[], o: { batch: string; designName: string; verdict: 'approved' | 'rejected'; reason: string; by: string; link: string }): OutgoingMail {
  const what = o.verdict === 'approved' ? 'approved' : 'rejected';
  const next = o.verdict === 'approved'
    ? 'The piece is accepted. The order is closed and keeps its measurements and timeline.'
    : 'The piece is not accepted. A regrowth comes as a new order when the physicist releases the run again.';
  return {
    to,
    subject: `Growth order ${o.batch} ${what}`,
    text: [`${o.by} ${what} growth order ${o.batch}${o.designName ? ` (${o.designName})` : ''}.`, '', `Reason: ${o.reason}`, '', next, '', `Open the order: ${o.link}`].join('\n') + footer,
  };
}
