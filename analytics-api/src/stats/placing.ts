/**
 * Checks one show result: entries a positive integer, placing an integer in 1..entries.
 *
 * @param caller the public function's name, for the error message
 * @throws `<caller> requires placings in 1..entries (got p of n)`
 */
export function checkPlacing(placing: number, entries: number, caller: string): void {
  if (!Number.isInteger(entries) || entries < 1 || !Number.isInteger(placing) || placing < 1 || placing > entries) {
    throw new Error(`${caller} requires placings in 1..entries (got ${placing} of ${entries})`);
  }
}
