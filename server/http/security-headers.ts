// Response headers: the page may run only its own scripts, start workers from itself or blob: URLs (the
// simulation worker), and show images from data:/blob: URLs (chart exports). HSTS and the upgrade of
// insecure requests only when the app is served over https, so a plain http://127.0.0.1 start keeps working.
import helmet from 'helmet';

export function securityHeaders(httpsOnly: boolean) {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        baseUri: ["'self'"],
        scriptSrc: ["'self'"],
        workerSrc: ["'self'", 'blob:'],
        imgSrc: ["'self'", 'data:', 'blob:'],
        // Charts set inline style attributes; styles cannot run code.
        styleSrc: ["'self'", "'unsafe-inline'"],
        fontSrc: ["'self'", 'data:'],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        frameAncestors: ["'none'"],
        formAction: ["'self'"],
        upgradeInsecureRequests: httpsOnly ? [] : null,
      },
    },
    strictTransportSecurity: httpsOnly ? { maxAge: 15552000, includeSubDomains: false } : false,
  });
}
