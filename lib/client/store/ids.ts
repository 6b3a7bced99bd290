/** Short ids that satisfy the plan schema's id pattern ([A-Za-z0-9_-], at most 64). */
let counter = 0;

export function newId(prefix: string): string {
  counter = (counter + 1) % 1_000_000;
  const rand = Math.random().toString(36).slice(2, 7);
  return `${prefix}-${Date.now().toString(36)}${counter.toString(36)}${rand}`;
}
