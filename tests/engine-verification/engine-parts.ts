/**
 * The engine parts the reference checks exercise, gathered in one place. They reach the engine's
 * static physics through the engine's public surface, engine/index.ts.
 */
export * from '../../engine/index';
