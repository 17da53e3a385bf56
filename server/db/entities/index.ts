export { Team } from './team';
export { MaterialFamily } from './material-family';
export { CapturedMail } from './captured-mail';
export { WorkerHeartbeat } from './worker-heartbeat';
