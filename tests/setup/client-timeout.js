/* global jest */
// A client screen test renders the whole router; on a loaded 2-core machine
// one takes well over jest's default 5 s. This is a limit, not a measurement.
// (jest 29 ignores `testTimeout` inside a project, so it is set here.)
jest.setTimeout(30_000);
