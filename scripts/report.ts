/**
 * Command-line report: `npm run report -- <file.json> [--json] [--units metric|imperial] [--target LUX]
 * [--csv DIR]`. Prints the focus figures of every fixture, the light on every face, coverage, and the
 * power and weight checks with their cautions; with `--csv` it writes the paperwork sheets
 * (schedule.csv, focus-chart.csv, power.csv) into DIR instead and says what it wrote. Bad files print
 * every problem with its path and exit with status 1; bad arguments exit with status 2.
 */
import { readFileSync } from 'node:fs';
import { buildReport, formatReportText, loadPlotText } from '../lib/plot';
import { writeCsvSheets } from './reportCsv';

function usage(message: string): never {
  process.stderr.write(
    `${message}\nUsage: npm run report -- <plot.json> [--json] [--units metric|imperial] [--target LUX] [--csv DIR]\n`,
  );
  process.exit(2);
}

const args = process.argv.slice(2);
let file: string | null = null;
let asJson = false;
let units: 'metric' | 'imperial' | null = null;
let targetLx: number | undefined;
let csvDir: string | null = null;
for (let index = 0; index < args.length; index += 1) {
  const arg = args[index];
  if (arg === '--json') asJson = true;
  else if (arg === '--units') {
    const value = args[(index += 1)];
    if (value !== 'metric' && value !== 'imperial')
      usage(`--units must be metric or imperial (got ${value ?? 'nothing'})`);
    units = value;
  } else if (arg === '--target') {
    const value = Number(args[(index += 1)]);
    if (!(value > 0) || !Number.isFinite(value))
      usage(`--target must be a level in lux above 0 (got ${args[index] ?? 'nothing'})`);
    targetLx = value;
  } else if (arg === '--csv') {
    const value = args[(index += 1)];
    if (value === undefined || value.startsWith('--')) usage('--csv needs a folder to write into');
    csvDir = value;
  } else if (arg.startsWith('--')) usage(`unknown option ${arg}`);
  else if (file === null) file = arg;
  else usage(`only one file at a time (got ${file} and ${arg})`);
}
if (file === null) usage('name a plot file');

let text: string;
try {
  text = readFileSync(file, 'utf8');
} catch (error) {
  process.stderr.write(
    `${file}: cannot read it (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})\n`,
  );
  process.exit(1);
}
const loaded = loadPlotText(text);
if (!loaded.ok) {
  process.stderr.write(
    `${file} is not a valid plot file:\n${loaded.errors.map((line) => `  ${line}`).join('\n')}\n`,
  );
  process.exit(1);
}
if (csvDir !== null) {
  const written = writeCsvSheets(loaded.document, csvDir);
  if (!written.ok) {
    process.stderr.write(`${written.message}\n`);
    process.exit(1);
  }
  process.stdout.write(written.lines.map((line) => `${line}\n`).join(''));
  process.exit(0);
}
const report = buildReport(loaded.document, { targetLx });
process.stdout.write(
  asJson
    ? `${JSON.stringify(report, null, 2)}\n`
    : formatReportText(report, units ?? loaded.document.displayUnits),
);
