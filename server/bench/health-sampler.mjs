// A separate process that calls /api/health one call at a time until told to stop, then sends its latencies (ms):
// measured apart from the process that sends and reads the large requests, whose own work would otherwise be counted.
const base = process.argv[2];
let running = true;
const latencies = [];
process.on('message', (message) => {
  if (message === 'stop') running = false;
});
while (running) {
  const start = performance.now();
  await (await fetch(`${base}/api/health`)).arrayBuffer();
  latencies.push(performance.now() - start);
  await new Promise((r) => setTimeout(r, 5));
}
process.send(latencies, () => process.exit(0));
