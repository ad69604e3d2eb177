// A browser journey under a loaded two-core machine takes seconds, not milliseconds.
jest.setTimeout(120_000);
