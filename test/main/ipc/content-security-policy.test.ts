// The policy is read the way a browser reads it (W3C Content Security Policy Level 3: directives
// separated by ";", sources by spaces) and checked for what would let remote or injected code run.
import { describe, expect, it } from 'vitest';
import { CONTENT_SECURITY_POLICY, CONTENT_SECURITY_POLICY_META } from '../../../main/ipc/content-security-policy';

function directives(policy: string): Map<string, string[]> {
  return new Map(
    policy
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0] !== '')
      .map(([name, ...sources]) => [name.toLowerCase(), sources]),
  );
}

describe('Content-Security-Policy', () => {
  const policy = directives(CONTENT_SECURITY_POLICY);

  it('defaults to the app itself and allows no remote origin anywhere', () => {
    expect(policy.get('default-src')).toEqual(["'self'"]);
    for (const [name, sources] of policy) {
      for (const source of sources) {
        expect(source, `${name} ${source}`).not.toMatch(/^(https?:|wss?:|\*|[a-z0-9.-]+\.[a-z]{2,})/i);
      }
    }
  });

  it('runs only the app\'s own scripts: no inline script, no eval', () => {
    expect(policy.get('script-src')).toEqual(["'self'"]);
    expect(CONTENT_SECURITY_POLICY).not.toContain("'unsafe-eval'");
    expect(policy.get('object-src')).toEqual(["'none'"]);
    expect(policy.get('base-uri')).toEqual(["'none'"]);
    expect(policy.get('frame-ancestors')).toEqual(["'none'"]);
  });

  it('allows the worker and data: images the map needs, nothing more; no inline styles in markup', () => {
    // The map and React set styles through the style property (CSSOM), which style-src does not
    // govern; a style attribute or <style> element in injected markup is refused.
    expect(policy.get('style-src')).toEqual(["'self'"]);
    expect(policy.get('worker-src')).toEqual(["'self'", 'blob:']);
    expect(policy.get('img-src')).toEqual(["'self'", 'data:', 'blob:']);
    expect(policy.get('connect-src')).toEqual(["'self'"]);
  });

  it('gives a meta-tag form without frame-ancestors (ignored in meta tags)', () => {
    const meta = directives(CONTENT_SECURITY_POLICY_META);
    expect(meta.has('frame-ancestors')).toBe(false);
    expect(meta.get('script-src')).toEqual(["'self'"]);
  });
});
