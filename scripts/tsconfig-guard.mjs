/**
 * node scripts/tsconfig-guard.mjs BEFORE.json tsconfig.json
 *
 * `next build` appends "<distDir>/types/**" and "<distDir>/dev/types/**" to tsconfig.json's
 * include list for any build folder it does not find there (it compares exact strings, so no glob
 * can cover every BW_DIST_DIR). The type-check runs before the build over the sources, so those
 * lines add nothing; this puts the committed file back when they are the only change.
 */
import { readFileSync, writeFileSync } from "node:fs";

const [beforePath, currentPath] = process.argv.slice(2);
const beforeText = readFileSync(beforePath, "utf8");
const currentText = readFileSync(currentPath, "utf8");
if (beforeText !== currentText) {
  const typesLine = /^\.next[^/]*\/(dev\/)?types\/\*\*\/\*\.ts$/;
  const before = JSON.parse(beforeText);
  const current = JSON.parse(currentText);
  const had = new Set(before.include ?? []);
  const added = (current.include ?? []).filter((p) => !had.has(p));
  current.include = (current.include ?? []).filter((p) => had.has(p) || !typesLine.test(p));
  if (JSON.stringify(current) === JSON.stringify(before)) {
    writeFileSync(currentPath, beforeText);
    console.log(`[benchwright] tsconfig.json kept as committed (next build had added ${added.join(", ")})`);
  } else {
    console.warn("[benchwright] tsconfig.json was changed during the build by something other than next's type folders; left as it is");
  }
}
