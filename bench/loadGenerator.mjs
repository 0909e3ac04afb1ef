/**
 * Load generator for bench/api.ts, run in its own process (child_process.fork) so that it does not share
 * the server's event loop, as real clients would not. Receives { opts, requests, warmup } and answers with
 * the latency of every 201 answer (warm-up and measured apart), the number of other answers in the
 * measured part, the request rate and its own CPU time.
 */
import autocannon from 'autocannon';

process.once('message', async ({ opts, requests, warmup }) => {
  const warmupTimes = [];
  const warm = autocannon({ ...opts, amount: warmup });
  warm.on('response', (_c, status, _b, ms) => {
    if (status === 201) warmupTimes.push(ms);
  });
  await warm;
  const cpu0 = process.cpuUsage();
  const times = [];
  let bad = 0;
  const inst = autocannon({ ...opts, amount: requests });
  inst.on('response', (_c, status, _b, ms) => {
    if (status === 201) times.push(ms);
    else bad++;
  });
  const result = await inst;
  const cpu = process.cpuUsage(cpu0);
  process.send({ times, warmupTimes, bad, reqPerSec: result.requests.average, cpuMs: (cpu.user + cpu.system) / 1000 }, () =>
    process.exit(0),
  );
});
