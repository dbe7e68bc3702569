/** Reads a JSON fixture written by test/reference/scripts/bootstrap_*. */
export async function readFixture<T>(name: string): Promise<T> {
  const { readFile } = await import('node:fs/promises');
  const url = new URL(`../../reference/fixtures/${name}`, import.meta.url);
  return JSON.parse(await readFile(url, 'utf8')) as T;
}

/** bootstrap_series.json (bootstrap_series.R): open R datasets and a library-RNG-free AR(1). */
export interface SeriesFixture {
  series: { name: string; source: string; n: number; values: number[] }[];
}

/** One series of bootstrap_series.json, as a Float64Array. */
export async function readSeries(name: string): Promise<Float64Array> {
  const fixture = await readFixture<SeriesFixture>('bootstrap_series.json');
  const found = fixture.series.find((s) => s.name === name);
  if (found === undefined) throw new Error(`no series ${name} in bootstrap_series.json`);
  return Float64Array.from(found.values);
}
