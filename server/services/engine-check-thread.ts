/**
 * The engine's verdict on what a request would store, in a worker thread:
 * building the spline of a large measured table takes a few hundred
 * milliseconds per case, which the API's event loop owes to other requests.
 */
import { judge } from './engine-judge';

/** Run by the API's thread pool (server/services/api-threads.ts). */
export default judge;
