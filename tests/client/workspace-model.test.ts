import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type AlterationEntry, type PairedSeam, applyOps, demoPattern, formatLength, replayAlterations } from '../../geometry/index.ts';
import { describeIntent, describeOp, inUnits } from '../../src/features/workspace/model/describe.ts';
import { amountAt, amountHandle, handlePoint } from '../../src/features/workspace/model/handles.ts';
import { applyIntent, type Intent, invertIntent, newEntryId } from '../../src/features/workspace/model/intents.ts';
import { crotchJoinShown, crotchJoinWords, measureRows, notchWords, pairedSeams } from '../../src/features/workspace/model/measurements.ts';
import { prefixFor, previewWith, replaySafely } from '../../src/features/workspace/model/replay.ts';
import { acceptPlan } from '../../src/features/workspace/model/plan.ts';
import { BLEND } from '../bench/alterations.ts';

const entry = (id: string, amount = 10): AlterationEntry => ({ id, enabled: true, op: { op: 'lengthen', line: 'lower leg', amount } });
const list = fc.uniqueArray(fc.constantFrom('a', 'b', 'c', 'd', 'e', 'f'), { maxLength: 6 }).map((ids) => ids.map((id, i) => entry(id, i + 1)));

function intentFor(entries: AlterationEntry[]): fc.Arbitrary<Intent> {
  const ids = entries.map((e) => e.id);
  const existing = ids.length > 0 ? fc.constantFrom(...ids) : fc.constant('zz');
  return fc.oneof(
    fc.record({ kind: fc.constant('add' as const), entry: fc.constantFrom('n1', 'n2').filter((id) => !ids.includes(id)).map((id) => entry(id, 99)), index: fc.integer({ min: 0, max: entries.length }) }),
    fc.record({ kind: fc.constant('remove' as const), id: existing }),
    fc.record({ kind: fc.constant('update' as const), id: existing, op: fc.integer({ min: -50, max: 50 }).map((amount) => ({ op: 'lengthen' as const, line: 'lower leg', amount })) }),
    fc.record({ kind: fc.constant('toggle' as const), id: existing, enabled: fc.boolean() }),
    fc.record({ kind: fc.constant('move' as const), id: existing, to: fc.integer({ min: 0, max: Math.max(0, entries.length - 1) }) }),
  );
}

describe('alteration-list intents', () => {
  it('undo restores the list exactly: apply(apply(L, i), inverse(L, i)) = L (property)', () => {
    fc.assert(
      fc.property(
        list.chain((l) => fc.tuple(fc.constant(l), intentFor(l))),
        ([l, intent]) => {
          const after = applyIntent(l, intent);
          expect(applyIntent(after, invertIntent(l, intent))).toEqual(l);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('never changes its input, and an intent about a missing entry changes nothing', () => {
    const l = [entry('a'), entry('b')];
    const copy = structuredClone(l);
    applyIntent(l, { kind: 'remove', id: 'a' });
    applyIntent(l, { kind: 'move', id: 'b', to: 0 });
    expect(l).toEqual(copy);
    expect(applyIntent(l, { kind: 'remove', id: 'x' })).toEqual(l);
    expect(applyIntent(l, { kind: 'update', id: 'x', op: { op: 'lengthen', line: 'x', amount: 1 } })).toEqual(l);
  });

  it('applying my unsaved intents on top of someone else\'s newer list keeps both changes', () => {
    const theirs = [entry('a'), entry('t', 50)];
    const mine: Intent[] = [{ kind: 'add', entry: entry('m', -76.2), index: 1 }, { kind: 'toggle', id: 'a', enabled: false }];
    const merged = mine.reduce(applyIntent, theirs);
    expect(merged.map((e) => [e.id, e.enabled])).toEqual([['a', false], ['m', true], ['t', true]]);
  });

  it('new ids are unique in the list', () => {
    let n = 0;
    const ids = ['x0', 'x1'];
    expect(newEntryId([entry('x0'), entry('x1')], () => ids[n++] ?? 'x2')).toBe('x2');
  });
});

describe('alterations in words, in the person\'s units', () => {
  it('says shorten or lengthen with the amount in inches or centimetres', () => {
    expect(describeOp({ op: 'lengthen', line: 'lower leg', amount: -76.2 }, 'in')).toBe('Shorten at “lower leg” by 3 in');
    expect(describeOp({ op: 'rise', line: 'rise', amount: 50.8 }, 'in')).toBe('Raise the rise by 2 in');
    expect(describeOp({ op: 'lengthen', line: 'lower leg', amount: 25 }, 'cm')).toBe('Lengthen at “lower leg” by 2.5 cm');
    expect(describeIntent({ kind: 'toggle', id: 'a', enabled: false }, [entry('a', -76.2)], 'in')).toBe('Switched off: Shorten at “lower leg” by 3 in');
  });

  it('shows the engine\'s millimetres in the person\'s units (25.4 mm per inch)', () => {
    expect(inUnits('a lengthen of -76.2 mm is a large change', 'in')).toBe('a lengthen of -3 in is a large change');
    expect(inUnits('an opening of 400 mm is more than the slash (350.5 mm) can open', 'cm')).toBe('an opening of 40 cm is more than the slash (35.1 cm) can open');
    expect(inUnits('piece "front" has no line named "lower leg"', 'in')).toBe('piece "front" has no line named "lower leg"');
  });
});

describe('replay in the browser and the drag preview', () => {
  const demo = demoPattern();
  const entries: AlterationEntry[] = [
    { id: 'b', enabled: true, op: BLEND },
    { id: 's', enabled: true, op: { op: 'lengthen', line: 'lower leg', amount: -76.2 } },
    { id: 'r', enabled: true, op: { op: 'rise', line: 'rise', amount: 50.8 } },
  ];

  it('the preview of a dragged amount equals a full replay with that amount', () => {
    const prefix = prefixFor(demo, entries, 's')!;
    const dragged = previewWith(prefix, { op: 'lengthen', line: 'lower leg', amount: -40 })!;
    const full = replayAlterations(demo, entries.map((e) => (e.id === 's' ? { ...e, op: { op: 'lengthen' as const, line: 'lower leg', amount: -40 } } : e))).pattern;
    expect(dragged).toEqual(full);
  });

  it('a refused entry keeps the result of the entries before it, and names the entry', () => {
    const bad: AlterationEntry = { id: 'x', enabled: true, op: { op: 'lengthen', line: 'no such line', amount: 5 } };
    const r = replaySafely(demo, [...entries, bad]);
    expect(r.error).toMatchObject({ index: 3, id: 'x' });
    expect(r.pattern).toEqual(replayAlterations(demo, entries).pattern);
  });

  it('the handle of a lengthen sits amount along the grain from the line, and reads the amount back', () => {
    const before = applyOps(demo, [BLEND]).pattern;
    const h = amountHandle(before, { op: 'lengthen', line: 'lower leg', amount: -76.2 })!;
    expect(Math.hypot(h.axis.x, h.axis.y)).toBeCloseTo(1, 12);
    const at = handlePoint(h, -76.2);
    expect(amountAt(h, at, 0)).toBeCloseTo(-76.2, 9);
    // rounded to 1/16 in when the person works in inches
    expect(amountAt(h, handlePoint(h, -76.3), 25.4 / 16)).toBeCloseTo(-76.2, 9);
    const rise = amountHandle(before, { op: 'rise', line: 'rise', amount: 50.8 })!;
    expect(rise.sense).toBe(-1);
    expect(amountAt(rise, handlePoint(rise, 50.8), 0)).toBeCloseTo(50.8, 9);
  });

  it('the handle of a slash and spread moves across the slash, toward the part that turns: dragging that way opens it', () => {
    const before = applyOps(demo, [BLEND]).pattern;
    const op = { op: 'slash-spread' as const, piece: 'back', from: { x: 200, y: 190 }, hinge: { x: -170, y: 192 }, amount: 15, move: 'waist' as const };
    const h = amountHandle(before, op)!;
    // across the slash
    expect(Math.abs(h.axis.x * (op.hinge.x - op.from.x) + h.axis.y * (op.hinge.y - op.from.y))).toBeLessThan(1e-9);
    // the waist side turns: the axis points up the piece (against the grain, y down)
    expect(h.axis.y).toBeLessThan(0);
    expect(amountAt(h, handlePoint(h, 15), 0)).toBeCloseTo(15, 9);
    // opening by +15 moves the waist-side corner at the side seam along the axis
    const back = (p: typeof before) => p.pieces.find((x) => x.name === 'back')!;
    const corner = (p: typeof before) => back(p).outlines[0]!.points.find((q) => q.name === 'top-side')!;
    const after = applyOps(before, [op]).pattern;
    const moved = { x: corner(after).x - corner(before).x, y: corner(after).y - corner(before).y };
    // (the corner is farther up than the slash, so only part of its turn lies along the axis)
    expect(moved.x * h.axis.x + moved.y * h.axis.y).toBeGreaterThan(1);
  });

  it('the measurements show what shortening 3 in did: inseam and side seam −76.2 mm, crotch unchanged', () => {
    // Trade fact (common practice, no source; issue 3): shortening the legs 3 in shortens inseam and outseam by 3 in.
    const now = replayAlterations(demo, entries.slice(0, 2)).pattern;
    const before = replayAlterations(demo, entries.slice(0, 1)).pattern;
    const rows = measureRows(now, before, undefined);
    const row = (key: string) => rows.find((r) => r.key === key)!;
    for (const piece of ['front', 'back']) {
      expect(Math.abs(row(`${piece}:inseam`).now - row(`${piece}:inseam`).before! + 76.2)).toBeLessThan(0.3);
      expect(Math.abs(row(`${piece}:side-seam`).now - row(`${piece}:side-seam`).before! + 76.2)).toBeLessThan(0.3);
      expect(row(`${piece}:crotch-curve`).now).toBeCloseTo(row(`${piece}:crotch-curve`).before!, 6);
    }
    expect(pairedSeams(now, undefined).map((p) => p.role).sort()).toEqual(['inseam', 'side-seam']);
  });

  it('the notches of a paired seam in words: meeting, apart (in the person\'s unit), or missing on one side', () => {
    const side = pairedSeams(demo, '10').find((p) => p.role === 'side-seam')!;
    expect(notchWords(side, 'in')).toBe('both notches meet within 1/16 in');
    expect(notchWords(pairedSeams(demo, '10').find((p) => p.role === 'inseam')!, 'cm')).toBe('the notch meets within 0.2 cm');
    // the back's hip notch 1/4 in (6.35 mm) higher: apart; then a notch fewer on the back
    const [knee, hip] = side.notches as [PairedSeam['notches'][number], PairedSeam['notches'][number]];
    const apart = { ...hip, second: { ...hip.second, fromHem: hip.second.fromHem + 6.35 }, difference: hip.difference - 6.35, withinTolerance: false };
    const moved = { ...side, notches: [knee, apart], notchesMatch: false };
    expect(notchWords(moved, 'in')).toBe(`notch hip-side is ${formatLength(hip.first.fromHem, 'in')} from the hem on the front, ${formatLength(hip.second.fromHem + 6.35, 'in')} on the back + yoke: ${formatLength(Math.abs(hip.difference - 6.35), 'in')} apart`);
    const fewer = { ...side, second: { ...side.second, notches: side.second.notches!.slice(0, 1) }, notches: [knee], notchesMatch: false };
    expect(notchWords(fewer, 'in')).toBe('the front has 2 notches here, the back + yoke 1');
    expect(notchWords({ ...side, first: { ...side.first, notches: [] }, second: { ...side.second, notches: [] }, notches: [] }, 'in')).toBeUndefined();
  });

  it('the crotch curves\' join in words: square on the demo, and a turn to true after blending sizes across the crotch', () => {
    expect(crotchJoinWords(crotchJoinShown(demo, '10')!)).toBe('Crotch curves: front 90°, back 90° at the crotch point — laid together at the inseam they join smoothly');
    // the seeded blend (size 4 at the hip, 8 at the thigh) bends the curves near the crotch point: the sewist trues them
    const blended = replayAlterations(demo, entries.slice(0, 1)).pattern;
    const join = crotchJoinShown(blended, undefined)!;
    expect(join.smooth).toBe(false);
    expect(crotchJoinWords(join)).toMatch(/^Crotch curves: front \d+°, back \d+° at the crotch point — laid together at the inseam they turn \d+° where they meet: true the crotch curve before cutting \(more than 5°\)$/);
  });
});

describe('accepting a fit plan', () => {
  it('keeps marked lines first and the other alterations after, and puts the plan\'s in place of the list\'s sizes and lengths', () => {
    const mark: AlterationEntry = { id: 'm', enabled: true, op: { op: 'mark-line', piece: 'front', role: 'lengthen', name: 'knee adjust', at: { x: 0, y: 800 } } };
    const old: AlterationEntry = { id: 'o', enabled: true, op: { op: 'lengthen', line: 'lower leg', amount: -20 } };
    const seam: AlterationEntry = { id: 's', enabled: true, op: { op: 'seam-allowance', width: 15 } };
    let n = 0;
    const out = acceptPlan([seam, old, mark], { steps: [{ op: BLEND }, { op: { op: 'rise', line: 'rise', amount: 20 } }] }, () => `p${n++}`);
    expect(out.map((e) => e.op.op)).toEqual(['mark-line', 'blend', 'rise', 'seam-allowance']);
    expect(new Set(out.map((e) => e.id)).size).toBe(out.length);
  });
});
