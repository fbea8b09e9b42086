/** Lists the routes an Express router really serves, by walking its layer stack. */
import type { Router } from 'express';
import type { HttpMethod } from './route-table';

interface LayerLike {
  rawPath?: unknown;
  route?: { path: unknown; methods: Record<string, boolean> };
  handle?: { stack?: unknown };
}

const METHODS: readonly HttpMethod[] = ['get', 'post', 'put', 'patch', 'delete'];

function walk(
  stack: readonly LayerLike[],
  prefix: string,
  out: { method: HttpMethod; path: string }[],
): void {
  for (const layer of stack) {
    if (layer.route && typeof layer.route.path === 'string') {
      for (const method of METHODS) {
        if (layer.route.methods[method]) out.push({ method, path: `${prefix}${layer.route.path}` });
      }
    } else if (layer.handle && Array.isArray(layer.handle.stack)) {
      const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
      walk(layer.handle.stack as LayerLike[], `${prefix}${mount}`, out);
    }
  }
}

/** Every `{method, path}` served by `router` when mounted at `prefix` (e.g. `/api`). */
export function listApiRoutes(
  router: Router,
  prefix: string,
): { method: HttpMethod; path: string }[] {
  const out: { method: HttpMethod; path: string }[] = [];
  walk((router as unknown as { stack: LayerLike[] }).stack, prefix, out);
  return out;
}
