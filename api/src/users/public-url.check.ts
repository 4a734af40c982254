import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { type Env, publicUrlMismatch } from '../config/env.js';

/**
 * Invitation and notice links are built from PUBLIC_URL. In development nothing sits between the
 * browser and the API, so a PUBLIC_URL naming another port means every link in mail is dead: say
 * so at boot rather than when someone clicks one.
 */
@Injectable()
export class PublicUrlCheck implements OnApplicationBootstrap {
  private readonly logger = new Logger('Config');

  constructor(private readonly config: ConfigService<Env, true>) {}

  onApplicationBootstrap(): void {
    if (this.config.get('NODE_ENV', { infer: true }) !== 'development') return;
    const why = publicUrlMismatch({ PUBLIC_URL: this.config.get('PUBLIC_URL', { infer: true }), HOST: this.config.get('HOST', { infer: true }), PORT: this.config.get('PORT', { infer: true }) });
    if (why) this.logger.warn(`${why} (set PUBLIC_URL to the address people open, or leave it unset)`);
  }
}
