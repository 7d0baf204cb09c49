// axe-core in a page served with the app's own Content Security Policy (script-src 'self', no inline scripts, no
// eval), and the findings in a form a person can act on: rule, impact, how many elements, the first one's selector.
//
// How axe gets in without weakening the policy: page.evaluate hands the axe source to Chromium over the DevTools
// protocol (Runtime.evaluate). Script evaluated by the debugger is not subject to the page's CSP, so the policy stays
// in force for everything the page itself loads, and the context needs no bypassCSP. A <script> tag (addScriptTag)
// would be refused by script-src 'self', as an attacker's injected script would be.
import fs from 'node:fs';
import type { Page } from 'playwright-core';

const AXE_SOURCE = fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

/** WCAG 2.0 and 2.1, levels A and AA (axe-core's tag names). */
export const WCAG_TAGS = ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'];

export type Impact = 'minor' | 'moderate' | 'serious' | 'critical';
export type Finding = { rule: string; impact: Impact | null; count: number; firstTarget: string; help: string };

type AxeNode = { target: unknown[] };
type AxeViolation = { id: string; impact?: Impact | null; help: string; nodes: AxeNode[] };
type AxeWindow = Window & { axe?: { run: (context: Document, options: object) => Promise<{ violations: AxeViolation[] }> } };

/** Runs axe's WCAG 2.0/2.1 A and AA rules on the whole document and returns every violation, worst first. */
export async function runAxe(page: Page): Promise<Finding[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.evaluate(AXE_SOURCE);
  const findings = await page.evaluate(async (tags) => {
    const axe = (window as AxeWindow).axe;
    if (!axe) throw new Error('axe-core did not load into the page');
    const result = await axe.run(document, { runOnly: { type: 'tag', values: tags }, resultTypes: ['violations'] });
    return result.violations.map((v) => ({
      rule: v.id,
      impact: v.impact ?? null,
      count: v.nodes.length,
      // A target is a list of selectors (one more per shadow root or frame crossed).
      firstTarget: v.nodes[0] ? v.nodes[0].target.map(String).join(' ⟶ ') : '',
      help: v.help,
    }));
  }, WCAG_TAGS);
  const rank: Record<string, number> = { critical: 0, serious: 1, moderate: 2, minor: 3 };
  return findings.sort((a, b) => (rank[a.impact ?? 'minor'] ?? 4) - (rank[b.impact ?? 'minor'] ?? 4) || a.rule.localeCompare(b.rule));
}

/** Serious and critical violations block; moderate and minor ones are reported but do not fail a screen. */
export function isBlocking(finding: Finding): boolean {
  return finding.impact === 'serious' || finding.impact === 'critical';
}

/** One line per violation: "color-contrast (serious) ×3 — first: #root … — Elements must meet minimum … contrast". */
export function describeFinding(finding: Finding): string {
  return `${finding.rule} (${finding.impact ?? 'no impact given'}) ×${finding.count} — first: ${finding.firstTarget} — ${finding.help}`;
}

/** The lines for a screen, headed by its name, for the test output. */
export function summarise(screen: string, findings: Finding[]): string {
  if (findings.length === 0) return `${screen}: no WCAG 2.0/2.1 A or AA violation`;
  return [`${screen}: ${findings.length} rule(s) violated`, ...findings.map((f) => `  ${describeFinding(f)}`)].join('\n');
}
