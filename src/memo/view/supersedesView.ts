// A revised memo's note on the revision it supersedes: the revision's number, the reasons in
// plain words (inputs whose digests changed, how many numbers differ, the largest forecast
// changes) and one sentence for page 1.
import { noLinks } from '../format/noLinks.js';
import type { Supersedes } from '../reviewPart.js';
import { SUPERSEDES_HEADING, supersedesReasons, supersedesSentence } from '../signOffWording.js';

export interface SupersedesView {
  revision: number;
  heading: string;
  reasons: string[];
  sentence: string;
}

export function supersedesView(supersedes: Supersedes): SupersedesView {
  return {
    revision: supersedes.revision,
    heading: SUPERSEDES_HEADING(supersedes.revision),
    reasons: supersedesReasons(supersedes).map(noLinks),
    sentence: noLinks(supersedesSentence(supersedes)),
  };
}
