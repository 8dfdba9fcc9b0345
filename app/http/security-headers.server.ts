// Response headers of every page (OWASP ASVS 5.0 V3.4): a nonce-based CSP, no framing,
// no MIME sniffing, a strict referrer policy, and HSTS when served over HTTPS.
export function securityHeaders(
  headers: Headers,
  opts: { nonce: string; dev: boolean; secure: boolean; formTargets: string[] },
) {
  const connect = opts.dev ? "'self' ws: wss:" : "'self'";
  const script = opts.dev ? `'self' 'nonce-${opts.nonce}' 'unsafe-eval'` : `'self' 'nonce-${opts.nonce}'`;
  const csp = [
    "default-src 'self'",
    `script-src ${script}`,
    // React's style={} attributes need inline styles; no inline <style> elements are used.
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    `connect-src ${connect}`,
    "object-src 'none'",
    "base-uri 'none'",
    "frame-ancestors 'none'",
    // Browsers apply form-action to the redirect after a post: the sign-in form lands on the provider.
    `form-action 'self' ${opts.formTargets.join(" ")}`.trim(),
  ].join("; ");
  headers.set("Content-Security-Policy", csp);
  headers.set("X-Content-Type-Options", "nosniff");
  headers.set("Referrer-Policy", "same-origin");
  headers.set("X-Frame-Options", "DENY");
  headers.set("Permissions-Policy", "camera=(self), microphone=(), geolocation=()");
  if (opts.secure) headers.set("Strict-Transport-Security", "max-age=31536000; includeSubDomains");
}
