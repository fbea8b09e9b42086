/**
 * The engine parts the reference checks exercise, gathered in one place. They reach the engine's
 * static physics through its public surface for it (engine/hydraulics/index.ts), which
 * engine/index.ts re-exports.
 */
export * from '../../engine/hydraulics/index';
