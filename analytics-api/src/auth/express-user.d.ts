import type { ResolvedAccess } from '../access/access-rules';

declare global {
  namespace Express {
    interface User {
      id: number;
      email: string;
      displayName: string;
      isAdmin: boolean;
      weightUnit: 'lb-oz' | 'kg';
      dateOrder: 'iso' | 'mdy';
    }
    interface Locals {
      access: ResolvedAccess;
    }
  }
}
export {};
