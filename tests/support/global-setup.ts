/** Global setup for the node-side suites; the server's template database is added here. */
export default async function setup(): Promise<void> {}
