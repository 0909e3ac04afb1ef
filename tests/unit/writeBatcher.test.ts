/** db/writeBatcher.ts: writes that arrive together share one statement; a failing write fails alone. */
import { describe, expect, it } from 'vitest';
import { WriteBatcher } from '../../server/db/writeBatcher.js';

/** A fake statement: records each batch, answers after the test releases it. */
function fakeSend(fail: (item: number) => boolean = () => false) {
  const batches: number[][] = [];
  const waiting: (() => void)[] = [];
  const send = (items: number[]) => {
    batches.push(items);
    return new Promise<(string | null)[]>((resolve, reject) => {
      waiting.push(() =>
        items.some(fail)
          ? reject(new Error(`bad item in ${items.join(',')}`))
          : resolve(items.map((i) => (i % 10 === 0 ? null : `row ${i}`))),
      );
    });
  };
  const releaseAll = async () => {
    while (waiting.length) {
      waiting.shift()!();
      await new Promise((r) => setImmediate(r));
    }
  };
  return { send, batches, releaseAll };
}

describe('WriteBatcher', () => {
  it('sends a lone write at once, on its own', async () => {
    const f = fakeSend();
    const b = new WriteBatcher({ send: f.send, maxInFlight: 1 });
    const p = b.write(1);
    expect(f.batches).toEqual([[1]]);
    await f.releaseAll();
    await expect(p).resolves.toBe('row 1');
  });

  it('groups the writes that arrive while a batch is in flight, and answers each its own row (or null)', async () => {
    const f = fakeSend();
    const b = new WriteBatcher({ send: f.send, maxInFlight: 1, maxBatch: 3 });
    const ps = [1, 2, 3, 4, 10, 6].map((i) => b.write(i));
    expect(f.batches).toEqual([[1]]); // the rest wait for the first statement
    await f.releaseAll();
    expect(f.batches).toEqual([[1], [2, 3, 4], [10, 6]]);
    await expect(Promise.all(ps)).resolves.toEqual(['row 1', 'row 2', 'row 3', 'row 4', null, 'row 6']);
  });

  it('keeps at most maxInFlight statements going', async () => {
    const f = fakeSend();
    const b = new WriteBatcher({ send: f.send, maxInFlight: 2 });
    const ps = [1, 2, 3, 4].map((i) => b.write(i));
    expect(f.batches).toEqual([[1], [2]]);
    await f.releaseAll();
    expect(f.batches).toEqual([[1], [2], [3, 4]]);
    await Promise.all(ps);
  });

  it('when a batch fails, sends its writes again one by one: only the bad one fails', async () => {
    const f = fakeSend((i) => i === 3);
    const b = new WriteBatcher({ send: f.send, maxInFlight: 1 });
    const first = b.write(1);
    const ps = [2, 3, 4].map((i) =>
      b.write(i).then(
        (r) => ({ ok: r }),
        (e: Error) => ({ error: e.message }),
      ),
    );
    await f.releaseAll();
    await first;
    expect(await Promise.all(ps)).toEqual([{ ok: 'row 2' }, { error: 'bad item in 3' }, { ok: 'row 4' }]);
    expect(f.batches).toEqual([[1], [2, 3, 4], [2], [3], [4]]);
  });
});
