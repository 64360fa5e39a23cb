import { Router, type RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { enforce, type AccessRule } from './access-rules';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';
export interface RouteEntry { method: Method; path: string; rule: AccessRule }

/**
 * Every API route is registered through here with its access rule, so no route can exist
 * without one, and the access-matrix test can list them all (`routes`).
 */
export class RouteRegistrar {
  readonly router = Router();
  readonly routes: RouteEntry[] = [];
  constructor(private readonly db: DataSource) {}

  add(method: Method, path: string, rule: AccessRule, ...handlers: RequestHandler[]): void {
    this.routes.push({ method, path, rule });
    this.router[method](path, enforce(rule, this.db), ...handlers);
  }
}
