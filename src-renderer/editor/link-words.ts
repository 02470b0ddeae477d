/** Short words for a design part's library link state (engine `LinkState`), shown on the part card. */
import type { LinkState } from '../../shared-model/index.ts';

export const LINK_WORDS: Readonly<Record<LinkState, string>> = {
  same: 'Same as library',
  differs: 'Differs from library',
  'part-missing': 'Part missing from library',
  'library-missing': 'Library missing',
};
