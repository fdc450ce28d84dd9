// Figures the security tests print for docs/reliability.md (the same numbers, from the suite).
export function recordCells(kind: string, cells: number, failures: number): void {
  console.info(`[reliability] ${kind}: ${cells} cells, ${failures} failures`);
}
