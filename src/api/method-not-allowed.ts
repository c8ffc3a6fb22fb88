/** Tells a 405 from a 404: the path exists, but not for this method. */

import type { FastifyInstance } from 'fastify';

export class RouteTable {
  private readonly routes: { pattern: RegExp; method: string }[] = [];

  /** Records every route Fastify registers (call before registering routes). */
  watch(app: FastifyInstance): void {
    app.addHook('onRoute', (route) => {
      const methods = Array.isArray(route.method) ? route.method : [route.method];
      const source = route.url
        .split('/')
        .map((part) => (part.startsWith(':') ? '[^/]+' : part === '*' ? '.*' : part.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')))
        .join('/');
      for (const method of methods) this.routes.push({ pattern: new RegExp(`^${source}$`), method: method.toUpperCase() });
    });
  }

  /** The methods the path accepts; empty when no route has the path. */
  allowedMethods(url: string): string[] {
    const path = url.split('?')[0] ?? url;
    return [...new Set(this.routes.filter((route) => route.pattern.test(path)).map((route) => route.method))].sort();
  }
}
