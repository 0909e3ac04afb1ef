/**
 * Group writes that arrive together into one statement (application-level group commit). Each write is
 * queued; while fewer than `maxInFlight` batches are being written, the queue is sent at once, so a lone
 * write is never delayed, and writes that arrive while PostgreSQL is busy go together in the next batch.
 * One statement per batch keeps every batch atomic; when a batch fails, its writes are sent again one by
 * one, so a bad write fails alone and the others are stored (a failed statement wrote nothing).
 *
 * Batching cuts PostgreSQL's work per stored run to a third or less (one parse, plan, commit and WAL
 * flush for the batch instead of one per run); see DEVELOPERS.md, "Stored runs".
 */
export interface WriteBatcherOptions<I, R> {
  /** Write these items in one statement; answer one result per item, in order (null: written nothing). */
  send: (items: I[]) => Promise<(R | null)[]>;
  maxBatch?: number;
  maxInFlight?: number;
}

interface Queued<I, R> {
  item: I;
  resolve: (r: R | null) => void;
  reject: (err: unknown) => void;
}

export class WriteBatcher<I, R> {
  private readonly queue: Queued<I, R>[] = [];
  private inFlight = 0;
  private readonly maxBatch: number;
  private readonly maxInFlight: number;

  constructor(private readonly opts: WriteBatcherOptions<I, R>) {
    this.maxBatch = opts.maxBatch ?? 32;
    this.maxInFlight = opts.maxInFlight ?? 2;
  }

  write(item: I): Promise<R | null> {
    return new Promise((resolve, reject) => {
      this.queue.push({ item, resolve, reject });
      this.pump();
    });
  }

  private pump(): void {
    while (this.inFlight < this.maxInFlight && this.queue.length > 0) {
      const batch = this.queue.splice(0, this.maxBatch);
      this.inFlight++;
      void this.sendBatch(batch).finally(() => {
        this.inFlight--;
        this.pump();
      });
    }
  }

  private async sendBatch(batch: Queued<I, R>[]): Promise<void> {
    try {
      const results = await this.opts.send(batch.map((q) => q.item));
      batch.forEach((q, i) => q.resolve(results[i] ?? null));
    } catch (err) {
      if (batch.length === 1) return batch[0]!.reject(err);
      // isolate the write that failed: nothing of the batch was stored, so each goes again on its own
      await Promise.all(
        batch.map((q) =>
          this.opts.send([q.item]).then(
            (r) => q.resolve(r[0] ?? null),
            (e: unknown) => q.reject(e),
          ),
        ),
      );
    }
  }
}
