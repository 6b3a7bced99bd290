/**
 * `npm run bench`: runs every suite in scripts/bench/*.ts, prints one table per suite and writes
 * them, dated, to docs/benchmarks.md. A suite exports `title` and `run()` returning rows.
 * Suites compare side by side in one run (against a reference library or a baseline) and report
 * ratios, since these machines are noisy. Each suite runs in its own process.
 */
import { readdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { spawnSync } from "node:child_process";
import { fileURLToPath, pathToFileURL } from "node:url";

export interface BenchTable {
  title: string;
  note?: string;
  columns: string[];
  rows: (string | number)[][];
}

export interface BenchSuite {
  order?: number;
  run(): Promise<BenchTable[]> | BenchTable[];
}

function toMarkdown(t: BenchTable): string {
  const head = `| ${t.columns.join(" | ")} |\n|${t.columns.map(() => "---").join("|")}|\n`;
  const body = t.rows.map((r) => `| ${r.map(String).join(" | ")} |`).join("\n");
  return `### ${t.title}\n\n${t.note ? t.note + "\n\n" : ""}${head}${body}\n`;
}

/** Runs one suite file in this process and prints its tables as JSON on the last line (the child side). */
async function runOne(dir: string, file: string): Promise<void> {
  const mod = (await import(pathToFileURL(join(dir, file)).href)) as Partial<BenchSuite>;
  const tables = typeof mod.run === "function" ? await mod.run() : [];
  process.stdout.write(`\n${MARK}${JSON.stringify(tables)}\n`);
}

const MARK = "@@bench-tables@@";

async function main() {
  const dir = join(process.cwd(), "scripts", "bench");
  if (process.argv[2] === "--one") return runOne(dir, process.argv[3]);
  const only = process.argv[2];
  const files = readdirSync(dir).filter((f) => f.endsWith(".ts") && (!only || f.includes(only)));
  const suites: { file: string; order: number }[] = [];
  for (const f of files) {
    const mod = (await import(pathToFileURL(join(dir, f)).href)) as Partial<BenchSuite>;
    if (typeof mod.run === "function") suites.push({ file: f, order: mod.order ?? 50 });
  }
  suites.sort((a, b) => a.order - b.order || a.file.localeCompare(b.file));
  const out: string[] = [];
  for (const { file } of suites) {
    process.stderr.write(`running ${file}...\n`);
    // Each suite in a fresh process: a heap left large by one suite would slow the next one's collector.
    const child = spawnSync(process.execPath, [...process.execArgv, fileURLToPath(import.meta.url), "--one", file], { encoding: "utf8", stdio: ["ignore", "pipe", "inherit"], maxBuffer: 64 * 1024 * 1024 });
    const line = child.stdout.split("\n").find((l) => l.startsWith(MARK));
    if (child.status !== 0 || !line) throw new Error(`bench suite ${file} failed (exit ${child.status})`);
    for (const t of JSON.parse(line.slice(MARK.length)) as BenchTable[]) {
      const md = toMarkdown(t);
      console.log(md);
      out.push(md);
    }
  }
  const when = new Date().toISOString().slice(0, 16).replace("T", " ");
  const doc = `# Benchmarks\n\nLatest run of \`npm run bench\`: ${when} UTC, on ${process.platform} ${process.arch}, Node ${process.version}. Each suite runs in a fresh process.\nTimes are medians of repeated runs; compare the ratios rather than the absolute numbers.\n\n${out.join("\n")}`;
  if (!only) writeFileSync(join(process.cwd(), "docs", "benchmarks.md"), doc);
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
