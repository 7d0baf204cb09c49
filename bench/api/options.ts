// Command line of `npm run bench:api`: --sites N --slices M [--seed S] | --demo, and --port P.
import net from 'node:net';

export type BenchOptions = { demo: boolean; sites: number; slices: number; seed: number; port: number | null };

export const USAGE = 'usage: npm run bench:api -- [--sites N --slices M] [--seed S] [--demo] [--port P]';

function wholeNumber(flag: string, value: string | undefined): number {
  const n = Number(value);
  if (value === undefined || !Number.isInteger(n) || n < 1) throw new Error(`${flag} needs a whole number ≥ 1\n${USAGE}`);
  return n;
}

export function parseOptions(args: string[]): BenchOptions {
  const o: BenchOptions = { demo: false, sites: 1000, slices: 20_000, seed: 1, port: null };
  for (let i = 0; i < args.length; i += 1) {
    const flag = args[i];
    if (flag === '--demo') o.demo = true;
    else if (flag === '--sites') o.sites = wholeNumber(flag, args[++i]);
    else if (flag === '--slices') o.slices = wholeNumber(flag, args[++i]);
    else if (flag === '--seed') o.seed = wholeNumber(flag, args[++i]);
    else if (flag === '--port') o.port = wholeNumber(flag, args[++i]);
    else throw new Error(`unknown option ${flag}\n${USAGE}`);
  }
  return o;
}

/** A port nobody listens on right now. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
    probe.on('error', reject);
  });
}
