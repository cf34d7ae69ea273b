import type { ModuleRef } from '@nestjs/core';

/**
 * Every provider registered under `token` in any module of the app: how a lower module hears from the
 * features above it without importing them (projects asks each feature for its resources' project, the
 * library asks who uses which process…). Empty when no module of this app registers one.
 */
export function registeredUnder<T>(moduleRef: ModuleRef, token: symbol): T[] {
  try {
    return moduleRef.get<T>(token, { strict: false, each: true });
  } catch {
    return [];
  }
}
