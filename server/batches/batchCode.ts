// Batch codes the server assigns when a row leaves the code empty: season year, species letters, running number.

/** First letter, then the following consonants (no letter twice in a row), topped up with the remaining letters. */
export function speciesLetters(key: string): string {
  const letters = key.replace(/[^a-z]/g, '');
  const picked = [letters[0] ?? 'x'];
  const rest: string[] = [];
  for (const ch of letters.slice(1)) {
    if (!'aeiou'.includes(ch) && ch !== picked.at(-1)) picked.push(ch);
    else rest.push(ch);
  }
  return [...picked, ...rest, 'x', 'x'].slice(0, 3).join('').toUpperCase();
}

/** "26-APL-" for apple grafted in 2026. */
export const codePrefix = (graftedOn: string, speciesKey: string) => `${graftedOn.slice(2, 4)}-${speciesLetters(speciesKey)}-`;

/** The next free code after the highest number already used with this prefix, three digits at least. */
export function nextCode(prefix: string, used: Iterable<string>): string {
  let highest = 0;
  for (const code of used) {
    if (!code.startsWith(prefix)) continue;
    const n = Number(code.slice(prefix.length));
    if (Number.isInteger(n) && n > highest) highest = n;
  }
  return `${prefix}${String(highest + 1).padStart(3, '0')}`;
}
