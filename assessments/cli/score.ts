/**
 * `npm run --silent score -- FILE` (FILE `-` reads standard input): scores one request or an array
 * of them and prints the result(s) as JSON in the same order. Exit 2 if any request was invalid.
 */
import { readFileSync } from "node:fs";
import { isScoreError, scoreUnknown } from "../rules";

function main(argv: string[]): number {
  const file = argv[0];
  if (!file) {
    process.stderr.write("usage: npm run --silent score -- FILE   (FILE '-' reads standard input)\n");
    return 2;
  }
  let text: string;
  try {
    text = readFileSync(file === "-" ? 0 : file, "utf8");
  } catch (err) {
    process.stderr.write(`cannot read ${file}: ${(err as Error).message}\n`);
    return 2;
  }
  let input: unknown;
  try {
    input = JSON.parse(text);
  } catch (err) {
    const out = { error: { message: `Not valid JSON: ${(err as Error).message}`, issues: [] } };
    process.stdout.write(JSON.stringify(out, null, 2) + "\n");
    return 2;
  }
  const results = Array.isArray(input) ? input.map(scoreUnknown) : scoreUnknown(input);
  process.stdout.write(JSON.stringify(results, null, 2) + "\n");
  const anyInvalid = Array.isArray(results) ? results.some(isScoreError) : isScoreError(results);
  return anyInvalid ? 2 : 0;
}

process.exitCode = main(process.argv.slice(2));
