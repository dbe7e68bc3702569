import { readFile } from 'node:fs/promises';

/** Pearson's chi-square statistic Σ (O − E)²/E over the bins (Pearson 1900). */
export function chiSquareStatistic(
  observed: ArrayLike<number>,
  expected: ArrayLike<number>,
): number {
  let statistic = 0;
  for (let i = 0; i < observed.length; i++) {
    const e = expected[i]!;
    statistic += (observed[i]! - e) ** 2 / e;
  }
  return statistic;
}

interface ChiSquareFixture {
  cases: { df: number; probability: number; quantile: number }[];
}

/** scipy.stats.chi2.ppf(probability, df), from bootstrap_chi_square.json (bootstrap_block_length.py). */
export async function chiSquareQuantile(df: number, probability: number): Promise<number> {
  const url = new URL('../reference/fixtures/bootstrap_chi_square.json', import.meta.url);
  const fixture = JSON.parse(await readFile(url, 'utf8')) as ChiSquareFixture;
  const found = fixture.cases.find((c) => c.df === df && c.probability === probability);
  if (found === undefined) throw new Error(`no chi-square quantile for df ${df}, p ${probability}`);
  return found.quantile;
}
