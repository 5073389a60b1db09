/**
 * The dependency audit gate (scripts/audit.ts) reads `npm audit --json` correctly: it fails on
 * high and critical advisories, passes on lower ones, and never reports "clean" when the
 * advisory service did not answer. The report shapes follow npm's audit report format 2
 * (npm 7 and later); the 405 body is what our build machines' registry returned on 2026-12-01.
 */
import { auditVerdict, describeVerdict } from '../scripts/audit';

function report(vulnerabilities: Record<string, { severity: string }>) {
  const tally = { info: 0, low: 0, moderate: 0, high: 0, critical: 0, total: 0 };
  for (const v of Object.values(vulnerabilities)) {
    tally[v.severity as keyof typeof tally] += 1;
    tally.total += 1;
  }
  return JSON.stringify({
    auditReportVersion: 2,
    vulnerabilities: Object.fromEntries(Object.entries(vulnerabilities).map(([name, v]) => [name, { name, severity: v.severity, isDirect: false, via: [], range: '*' }])),
    metadata: { vulnerabilities: tally, dependencies: { prod: 180, dev: 0, total: 180 } },
  });
}

describe('dependency audit gate', () => {
  it('passes a tree with no advisories', () => {
    const v = auditVerdict(report({}));
    expect(v.state).toBe('clean');
    expect(describeVerdict(v)).toMatch(/0 critical, 0 high.*no high or critical advisory/);
  });

  it('passes moderate and low advisories but lists them', () => {
    const v = auditVerdict(report({ uuid: { severity: 'moderate' }, tmp: { severity: 'low' } }));
    expect(v.state).toBe('clean');
    expect(v.flagged).toEqual(['uuid (moderate)', 'tmp (low)']);
    expect(describeVerdict(v)).toContain('flagged: uuid (moderate), tmp (low)');
  });

  it('fails on a high or a critical advisory and names the package', () => {
    const high = auditVerdict(report({ 'brace-expansion': { severity: 'high' }, uuid: { severity: 'moderate' } }));
    expect(high.state).toBe('failed');
    expect(high.blocking).toEqual(['brace-expansion (high)']);
    expect(describeVerdict(high)).toMatch(/1 high.*FAILED/);
    expect(auditVerdict(report({ jszip: { severity: 'critical' } })).state).toBe('failed');
  });

  it('says "not checked", never "clean", when the advisory service refuses', () => {
    const refused = JSON.stringify({
      message: '405 Method Not Allowed - POST https://registry.npmjs.org/-/npm/v1/security/advisories/bulk',
      statusCode: 405,
      body: '',
      error: { summary: '', detail: '' },
    });
    const v = auditVerdict(refused);
    expect(v.state).toBe('unchecked');
    expect(describeVerdict(v)).toMatch(/NOT CHECKED - 405 Method Not Allowed/);
    expect(auditVerdict('').state).toBe('unchecked');
    expect(auditVerdict('null').state).toBe('unchecked');
  });
});
