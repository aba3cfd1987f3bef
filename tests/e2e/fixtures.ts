import { expect, test as base } from '@playwright/test';

/**
 * Every browser test runs under this watch: the page's Content-Security-Policy must never refuse anything (a refusal
 * means a script, style or plot the policy breaks), and no page may throw. Both are collected for the whole test
 * and checked after it.
 */
export const test = base.extend<{ pageWatch: void }>({
  pageWatch: [
    async ({ page }, use) => {
      const problems: string[] = [];
      await page.addInitScript(() => {
        document.addEventListener('securitypolicyviolation', (e) => {
          console.error(`CSP refused ${e.blockedURI || 'inline'} under ${e.violatedDirective} at ${e.sourceFile}:${e.lineNumber}:${e.columnNumber}`);
        });
      });
      page.on('console', (message) => {
        const text = message.text();
        if (/Content Security Policy|CSP refused|Refused to (load|execute|apply|evaluate)/i.test(text)) problems.push(text);
      });
      page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
      await use();
      expect(problems, 'CSP refusals and page errors').toEqual([]);
    },
    { auto: true },
  ],
});

export { expect };
