import { runCompatRankBench } from './compat-rank';
import { runMixedLoadBench } from './mixed-load';
import { prepareBenchDatabase } from './prepare';
import { runPriceListImportBench } from './price-list-import';
import { runParseBench } from './price-list-parse';
import { runSearchBench } from './search-bench';

/** `npm run bench`: figures measured side by side in one run; no test asserts a timing. */
// `tsx tests/bench/run.ts search` runs one part; no argument runs them all.
const only = process.argv[2];
const wanted = (name: string) => !only || only === name;

async function main(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set (npm run bench sets it)');
  console.log('== preparing the bench database (demo scenario and scale data, idempotent)');
  await prepareBenchDatabase(url);
  if (wanted('compat')) {
    console.log('== compatibility ranking (in-process)');
    await runCompatRankBench();
  }
  if (wanted('parse')) {
    console.log('\n== price-list parsing (csv-parse + validation, no database)');
    await runParseBench();
  }
  if (wanted('import')) {
    console.log('\n== price-list import end to end (parse, validate, stage, diff, commit) against psql \\copy');
    await runPriceListImportBench(url);
  }
  if (wanted('search')) {
    console.log('\n== search');
    await runSearchBench();
  }
  if (wanted('mixed')) {
    console.log('\n== mixed load on shared services (issue 11)');
    await runMixedLoadBench(url);
  }
}

main()
  .then(() => process.exit(0))
  .catch((err: unknown) => {
    console.error(err);
    process.exit(1);
  });
