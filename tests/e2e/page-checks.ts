import { createRequire } from 'node:module';
import fs from 'node:fs';
import type { Browser, Locator, Page } from 'playwright-core';
import { expect } from 'vitest';
import { signInAs } from './harness';

const require = createRequire(import.meta.url);
let axeSource: string | undefined;

/** axe-core's script, read once from the installed package (never fetched). */
const axeScript = () =>
  (axeSource ??= fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8'));

export interface AxeFinding {
  id: string;
  impact: string | null;
  help: string;
  targets: string[];
}

/**
 * Options for a browser context axe is run in: the app's Content Security Policy refuses inline
 * scripts (as it should), and axe is injected as one.
 */
export const axeContext = { bypassCSP: true } as const;

/**
 * axe-core run in the page (its context made with `axeContext`); the serious and critical
 * findings, each with where it was found.
 */
export async function seriousAxeFindings(page: Page): Promise<AxeFinding[]> {
  if (!(await page.evaluate(() => 'axe' in window)))
    await page.addScriptTag({ content: axeScript() });
  const results = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: Document) => Promise<unknown> } }).axe;
    return (await axe.run(document)) as {
      violations: {
        id: string;
        impact: string | null;
        help: string;
        nodes: { target: string[] }[];
      }[];
    };
  });
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      targets: v.nodes.map((n) => n.target.join(' ')),
    }));
}

/** How far the page is wider than the window, in CSS px (0 when nothing sticks out). */
export const horizontalOverflow = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

/** Elements inside `scope` whose right edge passes the window's: what is cut off on a phone. */
export const cutOffElements = (scope: Locator) =>
  scope.evaluate((root) => {
    const width = window.innerWidth;
    return Array.from(root.querySelectorAll<HTMLElement>('*'))
      .filter((el) => {
        const box = el.getBoundingClientRect();
        return box.width > 0 && box.right > width + 0.5;
      })
      .map((el) => `${el.tagName.toLowerCase()}${el.className ? `.${String(el.className)}` : ''}`)
      .slice(0, 10);
  });

/** Visible buttons inside `scope` shorter than `min` CSS px, named by their text. */
export const shortButtons = (scope: Locator, min = 44) =>
  scope.evaluate((root, least) => {
    return Array.from(root.querySelectorAll<HTMLElement>('button, a[role="button"]'))
      .filter((el) => {
        const box = el.getBoundingClientRect();
        return box.width > 0 && box.height > 0 && box.height < least - 0.5;
      })
      .map((el) => `${el.textContent?.trim() ?? ''} (${el.getBoundingClientRect().height}px)`);
  }, min);

/** The sizes the field screens are checked at: a phone in the hand and a laptop. */
export const checkedViewports = [
  { width: 390, height: 844 },
  { width: 1280, height: 800 },
] as const;

/**
 * A fresh context at `viewport`, ready for axe, signed in as `email` and landed on the register;
 * with the id of the stand it landed on.
 */
export async function signedInForChecks(
  browser: Browser,
  baseUrl: string,
  email: string,
  viewport: { width: number; height: number },
) {
  const context = await browser.newContext({ ...axeContext, viewport });
  const page = await context.newPage();
  await signInAs(page, baseUrl, email);
  await page.waitForURL(/\/sugarbushes\/\d+\/trees/);
  const sugarbushId = Number(/\/sugarbushes\/(\d+)\//.exec(page.url())![1]);
  return { context, page, sugarbushId };
}

/** Nothing wider than the window and no serious axe finding; a failure names the viewport. */
export async function expectReadable(page: Page, viewport: { width: number; height: number }) {
  expect({ viewport, overflow: await horizontalOverflow(page) }).toEqual({ viewport, overflow: 0 });
  expect({ viewport, findings: await seriousAxeFindings(page) }).toEqual({
    viewport,
    findings: [],
  });
}
