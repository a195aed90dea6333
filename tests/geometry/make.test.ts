import { describe, expect, it } from 'vitest';
import { AlterationListError, alterationEntriesSchema, applyOps, demoPattern, replayAlterations, type AlterationEntry } from '../../geometry/index.ts';

const shorten: AlterationEntry = { id: 'a', enabled: true, op: { op: 'lengthen', line: 'lower leg', amount: -76.2 } };
const blend: AlterationEntry = { id: 'b', enabled: true, op: { op: 'blend', levels: [{ level: 'waist', size: '0' }, { level: 'hip', size: '25' }] } };

describe('a make\'s alteration list', () => {
  it('when entries are on, then the replay equals applyOps on their operations in order', () => {
    const pattern = demoPattern();
    const entries = [shorten, { ...shorten, id: 'c', op: { op: 'rise' as const, line: 'rise', amount: 50.8 } }];
    expect(replayAlterations(pattern, entries).pattern).toEqual(applyOps(pattern, entries.map((e) => e.op)).pattern);
  });

  it('when an entry is switched off, then it is skipped, and cautions name positions in the whole list', () => {
    const pattern = demoPattern();
    const r = replayAlterations(pattern, [{ ...shorten, enabled: false }, blend]);
    expect(r.pattern).toEqual(applyOps(pattern, [blend.op]).pattern);
    // size 25 is beyond the printed range (0–20): an extrapolation caution on the second entry
    expect(r.cautions.some((c) => c.code === 'extrapolated-size' && c.op === 1)).toBe(true);
  });

  it('when an entry is refused, then the error names its position and id, and says why', () => {
    const bad: AlterationEntry = { id: 'x', enabled: true, op: { op: 'lengthen', line: 'no such line', amount: 5 } };
    try {
      replayAlterations(demoPattern(), [shorten, { ...shorten, id: 'off', enabled: false }, bad]);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(AlterationListError);
      expect((e as AlterationListError).index).toBe(2);
      expect((e as AlterationListError).id).toBe('x');
      expect((e as Error).message).toMatch(/^alteration 3 \(lengthen\): .*no such line/);
    }
  });

  it('when two entries share an id, then the list is invalid', () => {
    expect(alterationEntriesSchema.safeParse([shorten, shorten]).success).toBe(false);
    expect(alterationEntriesSchema.safeParse([shorten, { ...shorten, id: 'z' }]).success).toBe(true);
  });
});
