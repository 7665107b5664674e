/**
 * The Content-Security-Policy of the built page, added as a meta tag by a
 * build-only Vite plugin (the dev server injects its own scripts and
 * styles). Everything loads from the page's own origin; no inline script,
 * no plugins, no base or form targets.
 *
 * No 'unsafe-eval': the budget schema's validator is compiled ahead of time
 * (ajv's standalone code, src/document/budget-validator.generated.ts), and
 * HyperFormula's parser evaluates no strings. The generated covariance
 * kernels (src/covariance/compiled-propagation.ts) run in the compute
 * worker, whose policy comes with its own script (none from this meta tag);
 * where `new Function` is refused they fall back to the generic loop.
 */
import type { Plugin } from 'vite';

export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "worker-src 'self'",
  "style-src 'self'",
  // Style attributes only (lit templates set widths and colours inline); <style> elements stay refused.
  "style-src-attr 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');

/** Adds the policy as the first element of <head> in `vite build` only. */
export function contentSecurityPolicy(): Plugin {
  return {
    name: 'sigma-ledger-csp',
    apply: 'build',
    transformIndexHtml: () => [{ tag: 'meta', attrs: { 'http-equiv': 'Content-Security-Policy', content: CONTENT_SECURITY_POLICY }, injectTo: 'head-prepend' }],
  };
}
