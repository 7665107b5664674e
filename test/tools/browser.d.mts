// Types of the shared browser helpers (browser.mjs) for TypeScript tests.
import type { Browser } from 'puppeteer-core';

export const PORT: number;
export const URL: string;
export function buildSite(): void;
export function startPreview(): Promise<import('node:child_process').ChildProcess>;
export function launchBrowser(): Promise<Browser>;
export function waitUntilComputed(page: import('puppeteer-core').Page, timeoutMs?: number): Promise<void>;
