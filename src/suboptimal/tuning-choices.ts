/**
 * What the filter-design fields of a row can say, for editors (the page's
 * "filter as tuned" line): which state models apply to a row's kind, as
 * filter-rows.ts accepts them, and a short text of a row's design.
 */
import type { SourceKind, TuningInput } from '../inputs/budget-input';

/** A filter model a row of some kind may take, with the words an editor shows. */
export interface TuningModelChoice {
  value: NonNullable<TuningInput['model']>;
  label: string;
}

/** By source kind: the models filterRows accepts (docs/suboptimal-filter.md); kinds not listed take none. */
const MODELS: Partial<Record<SourceKind, TuningModelChoice[]>> = {
  'bias-instability': [
    { value: 'gauss-markov', label: 'Gauss-Markov (as the truth)' }, { value: 'random-walk', label: 'random walk (state not carried as the truth has it)' },
  ],
  multipath: [{ value: 'folded', label: 'folded into R as white noise' }, { value: 'states', label: 'carried as Gauss-Markov states' }],
};

/** The filter models a row of `kind` may take (empty when its kind takes none). Throws nothing. */
export function tuningModels(kind: SourceKind): TuningModelChoice[] {
  return MODELS[kind] ?? [];
}
