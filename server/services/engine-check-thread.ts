/**
 * The engine's verdict on what a request would store, in a worker thread:
 * building the spline of a large measured table takes a few hundred
 * milliseconds per case, which the API's event loop owes to other requests.
 */
import { answerInThread } from '../threads/run-in-thread';
import { judge } from './engine-judge';

answerInThread(judge);
