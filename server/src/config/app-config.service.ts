import { Inject, Injectable } from '@nestjs/common';
import type { AppConfig, CharacterisationConfig, NodeEnv } from './app-config.js';

export const APP_CONFIG = Symbol('APP_CONFIG');

/** Typed read access to the configuration parsed at start-up. */
@Injectable()
export class AppConfigService {
  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  get nodeEnv(): NodeEnv {
    return this.config.nodeEnv;
  }
  get isProduction(): boolean {
    return this.config.nodeEnv === 'production';
  }
  get port(): number {
    return this.config.port;
  }
  get dataDir(): string {
    return this.config.dataDir;
  }
  get databaseUrl(): string | undefined {
    return this.config.databaseUrl;
  }
  get jwtSecret(): string | undefined {
    return this.config.jwtSecret;
  }
  get jwtTtlSeconds(): number {
    return this.config.jwtTtlSeconds;
  }
  get smtpUrl(): string | undefined {
    return this.config.smtpUrl;
  }
  get signupEnabled(): boolean {
    return this.config.signupEnabled;
  }
  get seedDemo(): boolean {
    return this.config.seedDemo;
  }
  get appUrl(): string {
    return this.config.appUrl;
  }
  get clientDist(): string {
    return this.config.clientDist;
  }
  get corsOrigins(): readonly string[] {
    return this.config.corsOrigins;
  }
  get trustProxyHops(): number {
    return this.config.trustProxyHops;
  }
  get characterisation(): CharacterisationConfig {
    return this.config.characterisation;
  }
}
