// Child process for the crash test: saves ever-new versions of a large file until it is killed.
import { writeFileAtomic } from '../../../main/workspace/atomic-write';

const target = process.argv[2];
const filler = 'x'.repeat(1024 * 1024);
for (let version = 1; ; version++) {
  await writeFileAtomic(target, JSON.stringify({ version, filler, end: version }));
  process.stdout.write(`saved ${version}\n`);
}
