// Real database round trips: allow more than Jest's default of 5 s when the machine is busy.
jest.setTimeout(30_000);
