import { runCompatRankBench } from './compat-rank';
import { runParseBench } from './price-list-parse';
import { runSearchBench } from './search-bench';

/** `npm run bench`: figures measured side by side in one run; no test asserts a timing. */
async function main(): Promise<void> {
  console.log('== compatibility ranking (in-process)');
  await runCompatRankBench();
  console.log('\n== price-list parsing (csv-parse + validation, no database)');
  await runParseBench();
  console.log('\n== search');
  await runSearchBench();
}

main()
  .then(() => process.exit(0))
  .catch((err: unknown) => {
    console.error(err);
    process.exit(1);
  });
