/**
 * `npm run bench`: runs every suite in scripts/bench/*.ts, prints one table per suite and writes
 * them, dated, to docs/benchmarks.md. A suite exports `title` and `run()` returning rows.
 * Suites compare side by side in one run (against a reference library or a baseline) and report
 * ratios, since these machines are noisy.
 */
import { readdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";

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

async function main() {
  const only = process.argv[2];
  const dir = join(process.cwd(), "scripts", "bench");
  const files = readdirSync(dir).filter((f) => f.endsWith(".ts") && (!only || f.includes(only))).sort();
  const suites: { file: string; suite: BenchSuite }[] = [];
  for (const f of files) {
    const mod = (await import(pathToFileURL(join(dir, f)).href)) as Partial<BenchSuite>;
    if (typeof mod.run === "function") suites.push({ file: f, suite: mod as BenchSuite });
  }
  suites.sort((a, b) => (a.suite.order ?? 50) - (b.suite.order ?? 50));
  const out: string[] = [];
  for (const { file, suite } of suites) {
    process.stderr.write(`running ${file}...\n`);
    for (const t of await suite.run()) {
      const md = toMarkdown(t);
      console.log(md);
      out.push(md);
    }
  }
  const when = new Date().toISOString().slice(0, 16).replace("T", " ");
  const doc = `# Benchmarks\n\nLatest run of \`npm run bench\`: ${when} UTC, on ${process.platform} ${process.arch}, Node ${process.version}.\nTimes are medians of repeated runs; compare the ratios rather than the absolute numbers.\n\n${out.join("\n")}`;
  if (!only) writeFileSync(join(process.cwd(), "docs", "benchmarks.md"), doc);
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
