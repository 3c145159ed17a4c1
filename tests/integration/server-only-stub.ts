// Stands in for the `server-only` marker package in integration tests, which run route handlers in Node.
export {};
