// The sentences every export and the report page share, so a sampled range is called evidence
// everywhere, in the same words as the terminal report.

export const EVIDENCE_NOTE =
  'Exhaustive ranges were checked case by case: for those sizes the statement is verified. Sampled ranges are random cases: evidence, not proof.';

export const SAMPLED_WORD = 'sampled (evidence, not proof)';
