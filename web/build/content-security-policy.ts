/**
 * The Content-Security-Policy of the built page, added as a meta tag by a
 * build-only Vite plugin (the dev server injects its own scripts and
 * styles). Everything loads from the page's own origin; no inline script,
 * no plugins, no base or form targets.
 *
 * 'unsafe-eval' stays for one reason: ajv compiles the budget schema's
 * validator with `new Function` when a file is opened or an autosave is
 * restored (src/document/budget-schema.ts). The generated covariance
 * kernels (src/covariance/compiled-propagation.ts) fall back to the generic
 * loop when `new Function` is refused, and HyperFormula's parser evaluates
 * nothing. Dropping 'unsafe-eval' needs the validator compiled ahead of time
 * (ajv's standalone code) from the schema, which is itself about to be
 * generated from the kind registries; see README.md.
 */
import type { Plugin } from 'vite';

export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self' 'unsafe-eval'",
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
