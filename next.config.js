// The phase name of `next dev` (the value of PHASE_DEVELOPMENT_SERVER in next/constants).
const PHASE_DEVELOPMENT_SERVER = 'phase-development-server';

/**
 * Security headers on every response. Next's own inline scripts and styles need 'unsafe-inline'
 * (no nonces here); the development server also needs 'unsafe-eval'. 'wasm-unsafe-eval' lets the
 * light-map workers compile their WebAssembly loop (it allows WebAssembly only, not eval of script;
 * without it they fall back to the JavaScript loop). Plot names and notes are only
 * ever rendered as text, so the policy is a second line of defence, not the first.
 */
function securityHeaders(phase) {
  const development = phase === PHASE_DEVELOPMENT_SERVER;
  const contentSecurityPolicy = [
    "default-src 'self'",
    `script-src 'self' 'unsafe-inline' 'wasm-unsafe-eval'${development ? " 'unsafe-eval'" : ''}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
  return [
    { key: 'Content-Security-Policy', value: contentSecurityPolicy },
    { key: 'X-Content-Type-Options', value: 'nosniff' },
    { key: 'X-Frame-Options', value: 'DENY' },
    { key: 'Referrer-Policy', value: 'same-origin' },
    { key: 'Cross-Origin-Opener-Policy', value: 'same-origin' },
    { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=()' },
  ];
}

/** @type {(phase: string) => import('next').NextConfig} */
module.exports = (phase) => ({
  reactStrictMode: true,
  poweredByHeader: false,
  async headers() {
    return [{ source: '/:path*', headers: securityHeaders(phase) }];
  },
});
