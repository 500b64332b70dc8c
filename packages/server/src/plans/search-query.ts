/**
 * InnoDB's default stopwords (INFORMATION_SCHEMA.INNODB_FT_DEFAULT_STOPWORD, MariaDB 10.11): they are
 * not indexed, so a required `+the*` would match nothing.
 */
const STOPWORDS = new Set(
  'a about an are as at be by com de en for from how i in is it la of on or that the this to was what when where who will with und www'.split(
    ' ',
  ),
);

/** Shorter words are not indexed (innodb_ft_min_token_size, 3 by default). */
const MIN_WORD_LENGTH = 3;

/**
 * What a person typed, as a MySQL/MariaDB boolean-mode FULLTEXT query in which every word must
 * appear, as a word or the start of one: "crosscut sleds" → "+crosscut* +sleds*". Operators typed
 * are dropped rather than interpreted. Null when no word is left to search for.
 */
export function booleanSearchOf(text: string): string | null {
  const words = text
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u)
    .filter((word) => word.length >= MIN_WORD_LENGTH && !STOPWORDS.has(word));
  const unique = [...new Set(words)];
  return unique.length > 0 ? unique.map((word) => `+${word}*`).join(' ') : null;
}
