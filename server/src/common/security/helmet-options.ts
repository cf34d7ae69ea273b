import type { HelmetOptions } from 'helmet';

/**
 * helmet's defaults, with two changes for a server that is often reached over plain HTTP on a
 * local network: no upgrade-insecure-requests (it would send the page's own assets to https), and
 * images may come from blob: and data: URLs (charts are downloaded as PNG through a canvas).
 */
export const HELMET_OPTIONS: HelmetOptions = {
  contentSecurityPolicy: {
    directives: {
      'img-src': ["'self'", 'data:', 'blob:'],
      'upgrade-insecure-requests': null,
    },
  },
};
