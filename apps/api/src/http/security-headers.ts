import type { RequestHandler } from 'express';
import helmet from 'helmet';

/**
 * SHA-256 hashes of the `onload="this.media='all'"` handler that the client
 * build's critical-CSS inlining puts on the stylesheet link. Without them the
 * Content-Security-Policy blocks the handler and the stylesheet never applies.
 */
const STYLESHEET_ONLOAD_HASHES = [
  "'sha256-MhtPZXr7+LpJUY5qtMutB+qWfQtMaPccfe7QXtCcEYc='",
  "'sha256-kx8Md/dUVxiWxH0xNDfI+0jY+S4Ev2Jri3jBG4rrm9E='",
];

/**
 * helmet's headers on every response, with a Content-Security-Policy for the
 * Angular client: its own scripts, fonts and images only; inline styles
 * (component styles are injected at run time); nothing from other origins.
 * `upgrade-insecure-requests` is off because the app is served over plain HTTP
 * on loopback.
 */
export function securityHeaders(): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        scriptSrcAttr: ["'unsafe-hashes'", ...STYLESHEET_ONLOAD_HASHES],
        styleSrc: ["'self'", "'unsafe-inline'"],
        fontSrc: ["'self'", 'data:'],
        imgSrc: ["'self'", 'data:', 'blob:'],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        baseUri: ["'self'"],
        formAction: ["'self'"],
        frameAncestors: ["'none'"],
        upgradeInsecureRequests: null,
      },
    },
  });
}
