import type { Limit } from './rate-limit';

const minutes = (n: number): number => n * 60;
const hours = (n: number): number => n * 3600;

/**
 * Every limit on a route anyone can call, in one place (README, "Accounts
 * and access"). Keys are per account or address and per network address
 * (`req.ip`, the proxy's client address behind a trusted proxy). Links are
 * checked before any password is hashed, so these bound the cheap refusals
 * too; argon2's cost is spent only on a live link or a real sign-in.
 */
export const anonymousLimits = {
  signIn: (email: string, ip: string): Limit[] => [
    { key: `signin:account:${email}`, max: 8, windowSeconds: minutes(15), what: 'sign-in attempts for one account' },
    { key: `signin:address:${ip}`, max: 40, windowSeconds: minutes(15), what: 'sign-in attempts from one network address' },
  ],
  signUpRequest: (email: string, ip: string): Limit[] => [
    { key: `signup:account:${email}`, max: 3, windowSeconds: hours(1), what: 'sign-up requests for one e-mail address' },
    { key: `signup:address:${ip}`, max: 10, windowSeconds: hours(1), what: 'sign-up requests from one network address' },
  ],
  resetRequest: (email: string, ip: string): Limit[] => [
    { key: `reset:account:${email}`, max: 3, windowSeconds: hours(1), what: 'reset requests for one e-mail address' },
    { key: `reset:address:${ip}`, max: 20, windowSeconds: hours(1), what: 'reset requests from one network address' },
  ],
  /** Opening a sign-up or invitation link before choosing a password. */
  linkPreview: (ip: string): Limit[] => [
    { key: `link-preview:address:${ip}`, max: 120, windowSeconds: hours(1), what: 'link look-ups from one network address' },
  ],
  signUpConfirm: (ip: string): Limit[] => [
    { key: `signup-confirm:address:${ip}`, max: 60, windowSeconds: hours(1), what: 'sign-up confirmations from one network address' },
  ],
  resetConfirm: (ip: string): Limit[] => [
    { key: `reset-confirm:address:${ip}`, max: 60, windowSeconds: hours(1), what: 'password resets from one network address' },
  ],
  invitationAccept: (ip: string): Limit[] => [
    { key: `invitation-accept:address:${ip}`, max: 60, windowSeconds: hours(1), what: 'invitation acceptances from one network address' },
  ],
  /** Signed in, but it verifies a password: a stolen session must not become a password oracle. */
  passwordChange: (userId: string): Limit[] => [
    { key: `password-change:account:${userId}`, max: 8, windowSeconds: minutes(15), what: 'password changes for one account' },
  ],
} as const;
