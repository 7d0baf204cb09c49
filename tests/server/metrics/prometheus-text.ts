// A strict reader of the Prometheus text format (version 0.0.4) for tests: every sample line must parse, every
// sample must belong to a family announced by # HELP and # TYPE. Returns the samples keyed `name{labels}`.
export type Samples = Map<string, number>;

const SAMPLE = /^([a-zA-Z_:][a-zA-Z0-9_:]*)(\{(?:[a-zA-Z_][a-zA-Z0-9_]*="(?:[^"\\]|\\.)*",?)*\})? (\S+)( -?\d+)?$/;
const SUFFIXES = ['_bucket', '_sum', '_count', '_total', '_created'];

export function parsePrometheusText(text: string): Samples {
  const helped = new Set<string>();
  const typed = new Set<string>();
  const samples: Samples = new Map();
  for (const line of text.split('\n')) {
    if (line === '') continue;
    const meta = /^# (HELP|TYPE) ([a-zA-Z_:][a-zA-Z0-9_:]*) (.+)$/.exec(line);
    if (meta) {
      if (meta[1] === 'TYPE' && !/^(counter|gauge|histogram|summary|untyped)$/.test(meta[3])) throw new Error(`bad TYPE line: ${line}`);
      (meta[1] === 'HELP' ? helped : typed).add(meta[2]);
      continue;
    }
    const m = SAMPLE.exec(line);
    if (!m) throw new Error(`not a Prometheus sample line: ${line}`);
    const value = Number(m[3] === '+Inf' ? Infinity : m[3] === '-Inf' ? -Infinity : m[3]);
    // prom-client writes NaN as "Nan" (e.g. the event-loop lag before its first sample); Prometheus reads the
    // value with Go's ParseFloat, which takes any case of NaN.
    if (Number.isNaN(value) && m[3].toLowerCase() !== 'nan') throw new Error(`bad value in: ${line}`);
    const family = [m[1], ...SUFFIXES.filter((s) => m[1].endsWith(s)).map((s) => m[1].slice(0, -s.length))]
      .find((name) => typed.has(name));
    if (!family || !helped.has(family)) throw new Error(`sample without # HELP and # TYPE: ${line}`);
    samples.set(`${m[1]}${m[2] ?? ''}`, value);
  }
  return samples;
}
