export { Team } from './team';
export { MaterialFamily } from './material-family';
export { MaterialFamilyVersion } from './material-family-version';
export { CapturedMail } from './captured-mail';
export { WorkerHeartbeat } from './worker-heartbeat';
