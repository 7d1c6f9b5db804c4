// A plugin of the working group's notebook: a statistic that is not built in, added to the
// language through hunch.yaml. Plugins are code: hunch loads them only from the project's own
// hunch.yaml, never from a conjecture or a counterexample file.

/** The number of alternating runs: maximal monotone stretches of the one-line notation. */
function alternatingRuns(w) {
  const a = w.a; // one-line notation, a[i-1] = w(i)
  if (a.length < 2) return 0;
  let runs = 1;
  for (let i = 2; i < a.length; i++) {
    if ((a[i] > a[i - 1]) !== (a[i - 1] > a[i - 2])) runs++;
  }
  return runs;
}

export const functions = [
  {
    name: 'alternatingRuns',
    params: [{ name: 'w', type: 'permutation' }],
    returns: 'integer',
    description: 'the number of alternating runs (maximal increasing or decreasing stretches) of w',
    example: 'alternatingRuns(perm([1, 3, 2, 4]))',
    exampleValue: '3',
    impl: alternatingRuns,
  },
];
