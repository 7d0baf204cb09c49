// `npm run plan -- <scenario.json> --window <id> [--mode serial|islands|shared-eval|greedy|exact] [--seed N] [--json]`.
import { main } from './run-plan';

// Set the exit code rather than calling process.exit, so a large plan on a pipe is flushed in full.
// `void`: main catches every error itself and answers with an exit code, so its promise never rejects.
void main(process.argv.slice(2), { out: (t) => process.stdout.write(t), err: (t) => process.stderr.write(t) }).then((code) => {
  process.exitCode = code;
});
