export { Team } from './team';
export { MaterialFamily } from './material-family';
export { MaterialFamilyVersion } from './material-family-version';
export { CapturedMail } from './captured-mail';
export { WorkerHeartbeat } from './worker-heartbeat';
export { AppUser } from './app-user';
export { Invitation } from './invitation';
export { PasswordReset } from './password-reset';
