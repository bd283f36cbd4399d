import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import ts from 'typescript';
import { matchRoutes } from 'react-router-dom';
import type { Router } from 'express';
import type { Page } from 'playwright-core';
import type { AxeResults } from 'axe-core';
import { sitePagesRouter } from '@server/pages/site-router';
import { pagesRouter } from '@server/pages/router';
import { eventPagesRouter } from '@server/pages/event-router';
import { buildLogPagesRouter } from '@server/pages/build-log-router';
import { votePagesRouter } from '@server/pages/vote-router';

/**
 * Accessibility checks with axe-core's own engine, injected into the page (`page.addScriptTag`;
 * the context is made with `bypassCSP: true`, since the app's content security policy refuses an
 * inline script). A screen passes with no serious or critical violation, less the exceptions below.
 * Only the rules that can report a serious or critical violation are run (`rulesThatCanFail`): the
 * others (landmarks, heading order, region…) are moderate or minor by axe's own rule table.
 */
const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');

/** The impacts that fail a screen. */
const FAILING = ['serious', 'critical'];

/**
 * Findings we accept, each with why. `where` matches the screen's path; `target` the element's selector.
 * Keep this short: a finding belongs here only when the product is right and the rule cannot know it.
 */
export const ACCEPTED: ReadonlyArray<{ rule: string; where?: RegExp; target?: RegExp; why: string }> = [];

type Finding = { rule: string; impact: string; help: string; targets: string[] };

/** What axe-core keeps of a rule (`axe._audit.rules`): a rule's `impact`, when set, is the impact of each of its violations. */
type AxeRule = { id: string; enabled: boolean; tags: string[]; impact?: string; any: Array<{ id: string }>; all: Array<{ id: string }>; none: Array<{ id: string }> };

declare global {
  interface Window {
    axe?: {
      run: (context: Document, options: object) => Promise<AxeResults>;
      _audit: { rules: AxeRule[]; data: { checks: Record<string, { impact?: string } | undefined> } };
    };
    /** The rules of this page's axe that can fail a screen, worked out once per page load. */
    axeRulesThatCanFail?: string[];
  }
}

/**
 * The rules axe runs by default (enabled, not experimental) whose violations can be serious or
 * critical: the rule's own impact when axe gives it one (axe then puts it on every violation of the
 * rule), else the highest impact of its checks. Runs in the page, and keeps the list there.
 */
function rulesThatCanFail(failing: string[]): string[] {
  const { rules, data } = window.axe!._audit;
  window.axeRulesThatCanFail = rules
    .filter((r) => r.enabled && !r.tags.includes('experimental'))
    .filter((r) => (r.impact ? [r.impact] : [...r.any, ...r.all, ...r.none].map((c) => data.checks[c.id]?.impact)).some((i) => i !== undefined && failing.includes(i)))
    .map((r) => r.id);
  return window.axeRulesThatCanFail;
}

/** Runs axe on the screen now shown and returns its serious and critical findings, less the accepted ones, as lines. */
export async function axeFindings(page: Page, where: string): Promise<{ failing: string[]; minor: string[] }> {
  if (!(await page.evaluate(() => typeof window.axe === 'object'))) {
    await page.addScriptTag({ content: AXE_SOURCE });
    // axe's rule table is read from its internals: if that ever changes shape, fail loudly rather than check nothing.
    const rules = await page.evaluate(rulesThatCanFail, FAILING);
    if (!['color-contrast', 'label', 'button-name', 'image-alt', 'aria-valid-attr-value'].every((r) => rules.includes(r))) throw new Error(`axe's rules that can fail look wrong: ${rules.join(', ')}`);
  }
  const found: Finding[] = await page.evaluate(async () => {
    // No preload: it fetches every stylesheet again for one rule (css-orientation-lock), which then reports nothing.
    const results = await window.axe!.run(document, { runOnly: { type: 'rule', values: window.axeRulesThatCanFail! }, resultTypes: ['violations'], preload: false });
    return results.violations.map((v) => ({ rule: v.id, impact: v.impact ?? 'minor', help: v.help, targets: v.nodes.map((n) => n.target.join(' ')) }));
  });
  const failing: string[] = [];
  const minor: string[] = [];
  for (const f of found) {
    const targets = f.targets.filter((t) => !ACCEPTED.some((a) => a.rule === f.rule && (a.where?.test(where) ?? true) && (a.target?.test(t) ?? true)));
    if (targets.length === 0) continue;
    const line = `${where}: ${f.rule} (${f.impact}) ${f.help}: ${targets.slice(0, 4).join(' | ')}${targets.length > 4 ? ` … ${targets.length} in all` : ''}`;
    (FAILING.includes(f.impact) ? failing : minor).push(line);
  }
  return { failing, minor };
}

/** The client's screens, read from its route table (client/src/app/router.tsx): every path, nested ones joined. */
export function screensOfTheApp(file = path.resolve('client/src/app/router.tsx')): string[] {
  const source = ts.createSourceFile(file, readFileSync(file, 'utf8'), ts.ScriptTarget.Latest, true, ts.ScriptKind.TSX);
  const out: string[] = [];
  const join = (parent: string, p: string) => (p.startsWith('/') || p === '*' ? p : `${parent.replace(/\/$/, '')}/${p}`);
  const literal = (node: ts.Node | undefined) => (node && ts.isStringLiteralLike(node) ? node.text : undefined);
  const visit = (node: ts.Node, parent: string): void => {
    if (ts.isObjectLiteralExpression(node)) {
      const prop = (name: string) => node.properties.find((p): p is ts.PropertyAssignment => ts.isPropertyAssignment(p) && p.name.getText() === name)?.initializer;
      const own = literal(prop('path'));
      let here = parent;
      if (own !== undefined) out.push((here = join(parent, own)));
      else if (prop('index')?.kind === ts.SyntaxKind.TrueKeyword) out.push(parent);
      node.forEachChild((c) => visit(c, here));
      return;
    }
    if (ts.isCallExpression(node) && node.expression.getText() === 'lazyScreen') {
      const own = literal(node.arguments[0]);
      if (own !== undefined) out.push(join(parent, own));
    }
    node.forEachChild((c) => visit(c, parent));
  };
  const table = (node: ts.Node): ts.Node | undefined => (ts.isCallExpression(node) && node.expression.getText() === 'createBrowserRouter' ? node.arguments[0] : node.forEachChild(table));
  const routes = table(source);
  if (!routes) throw new Error(`no createBrowserRouter([...]) in ${file}`);
  visit(routes, '');
  return [...new Set(out)];
}

/** The server's public pages: every GET path of the page routers, as the app mounts them. */
export function pagesOfTheServer(): string[] {
  const routers: Router[] = [sitePagesRouter, pagesRouter, eventPagesRouter, buildLogPagesRouter, votePagesRouter];
  return routers.flatMap((r) =>
    r.stack.flatMap((layer) => {
      const route = layer.route as { path: string; methods?: Record<string, boolean> } | undefined;
      return route?.methods?.get ? [route.path] : [];
    }),
  );
}

/** The route pattern of a path among `patterns` (the best match, as the router picks it), or undefined. */
export function patternOf(patterns: readonly string[], pathname: string): string | undefined {
  const matches = matchRoutes(patterns.map((p) => ({ path: p })), pathname);
  return matches?.at(-1)?.route.path;
}

/**
 * What one viewport's axe checks saw. Each screen (a route pattern of the client's table or of the
 * server's pages, plus its query) is checked once per viewport, as the first role to reach it; the
 * screens in `byRole` are made of different panels for each role, and are checked once per role.
 * A role's context is reused across its screens; the engine stays loaded across in-app navigations
 * and is injected again only after a full page load.
 */
export class AxeLedger {
  readonly checked = new Set<string>();
  readonly failing: string[] = [];
  readonly minor: string[] = [];
  readonly paths = new Set<string>();
  /** The screens checked (route pattern and query), whatever the role. */
  readonly screens = new Set<string>();
  readonly timings: Array<[string, number]> = [];
  seconds = 0;
  private readonly patterns = [...screensOfTheApp(), ...pagesOfTheServer()];

  constructor(private readonly byRole: readonly string[] = []) {}

  /** Checks the screen now shown as `role` unless it was checked already; returns its failing findings. */
  async check(page: Page, role: string): Promise<string[]> {
    const url = new URL(page.url());
    const pattern = patternOf(this.patterns, url.pathname) ?? url.pathname;
    const screen = `${pattern}${url.search}`;
    const key = this.byRole.includes(pattern) ? `${role} at ${screen}` : screen;
    this.paths.add(url.pathname);
    if (this.checked.has(key)) return [];
    this.checked.add(key);
    this.screens.add(screen);
    const started = performance.now();
    const { failing, minor } = await axeFindings(page, `${role} at ${url.pathname}${url.search}`);
    const took = (performance.now() - started) / 1000;
    this.seconds += took;
    this.timings.push([key, took]);
    this.failing.push(...failing);
    this.minor.push(...minor);
    return failing;
  }

  /** The patterns of `patterns` that no visited path matched, less the exempt ones. */
  missing(patterns: readonly string[], exempt: ReadonlyMap<string, string>): string[] {
    const covered = new Set([...this.paths].map((p) => patternOf(patterns, p)));
    return patterns.filter((p) => !covered.has(p) && !exempt.has(p));
  }
}
