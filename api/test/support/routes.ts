import { RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants';
import { DiscoveryService, MetadataScanner, ModulesContainer, Reflector } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { type AccessRule, accessRuleOf } from '../../src/common/guards/roles.guard';
import { API_PREFIX } from '../../src/create-app';

export interface DeclaredRoute {
  method: string;
  path: string;
  rule: AccessRule;
  handler: string;
}

function joinPath(...parts: string[]): string {
  return `/${parts
    .flatMap((part) => part.split('/'))
    .filter(Boolean)
    .join('/')}`;
}

/** Every controller route of the running application, with the access rule it declares. */
export function declaredRoutes(app: NestExpressApplication): DeclaredRoute[] {
  const discovery = new DiscoveryService(app.get(ModulesContainer));
  const scanner = new MetadataScanner();
  const reflector = new Reflector();
  const routes: DeclaredRoute[] = [];
  for (const wrapper of discovery.getControllers()) {
    const controller = wrapper.metatype as (new (...args: never[]) => object) | null;
    if (!controller) continue;
    const prefixes = ([] as string[]).concat(Reflect.getMetadata(PATH_METADATA, controller) ?? '');
    const prototype = controller.prototype as Record<string, unknown>;
    for (const name of scanner.getAllMethodNames(prototype)) {
      const handler = prototype[name];
      if (typeof handler !== 'function') continue;
      const paths = Reflect.getMetadata(PATH_METADATA, handler) as string | string[] | undefined;
      if (paths === undefined) continue;
      const method = RequestMethod[Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod];
      const rule = accessRuleOf(reflector, [handler as () => unknown, controller]);
      for (const prefix of prefixes) {
        for (const path of ([] as string[]).concat(paths)) {
          routes.push({
            method,
            path: joinPath(API_PREFIX, prefix, path),
            rule,
            handler: `${controller.name}.${name}`,
          });
        }
      }
    }
  }
  return routes;
}

interface ExpressLayer {
  route?: { path: string; methods: Record<string, boolean> };
}

/** What Express itself will answer (every registered route), as "METHOD /path". */
export function expressRoutes(app: NestExpressApplication): string[] {
  const express = app.getHttpAdapter().getInstance() as { router: { stack: ExpressLayer[] } };
  return express.router.stack.flatMap((layer) =>
    layer.route
      ? Object.keys(layer.route.methods)
          .filter((method) => method !== '_all')
          .map((method) => `${method.toUpperCase()} ${layer.route!.path}`)
      : [],
  );
}
