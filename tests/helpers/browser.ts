import { mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const FROTHLINE_URL = process.env.FROTHLINE_URL ?? 'http://127.0.0.1:5180';
const SHOTS = process.env.SCREENSHOT_DIR ?? path.resolve('test-results/screenshots');
const demo = JSON.parse(readFileSync('server/db/seed/demo-users.json', 'utf8')) as {
  password: string;
  users: { email: string; role: string }[];
};

export interface Browser {
  context: BrowserContext;
  page: Page;
  close: () => Promise<void>;
}

/** Debian's Chromium through playwright-core, with a fresh profile. */
export async function launch(viewport = { width: 1366, height: 860 }): Promise<Browser> {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'frothline-chromium-'));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    close: async () => {
      await context.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export function demoEmail(role: string): string {
  const u = demo.users.find((x) => x.role === role);
  if (!u) throw new Error(`no demo user with role ${role}`);
  return u.email;
}

export async function signInAs(page: Page, role: string): Promise<void> {
  await page.goto(`${FROTHLINE_URL}/sign-in`);
  await page.getByLabel('E-mail').fill(demoEmail(role));
  await page.getByLabel('Password').fill(demo.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((u) => !u.pathname.startsWith('/sign-in'));
}

export async function shot(page: Page, name: string): Promise<string> {
  mkdirSync(SHOTS, { recursive: true });
  const file = path.join(SHOTS, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
