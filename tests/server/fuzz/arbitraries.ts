import fc from 'fast-check';
import { buildPrint } from '../../support/factories';

/** Field names the API knows, so random objects reach deeper than "unknown key". */
const KNOWN_FIELDS = [
  'email',
  'role',
  'active',
  'password',
  'name',
  'currentPassword',
  'newPassword',
  'title',
  'accessionNumber',
  'process',
  'paperId',
  'negativeId',
  'locationId',
  'processing',
  'tags',
  'madeOn',
  'code',
  'kind',
  'chemical',
  'parentId',
  'status',
  'description',
  'stage',
  'minutes',
];

const weirdValue = fc.oneof(
  fc.anything(),
  fc.string(),
  fc.integer(),
  fc.double(),
  fc.constantFrom(
    null,
    true,
    false,
    '',
    ' ',
    -1,
    0,
    1e308,
    '1e400',
    'NaN',
    '<script>',
    "' OR 1=1 --",
  ),
  fc.string({ minLength: 300, maxLength: 5000 }),
);

/** Random and malformed JSON bodies. */
export const jsonBody = fc.oneof(
  fc.anything(),
  fc.dictionary(fc.constantFrom(...KNOWN_FIELDS), weirdValue),
  fc.jsonValue(),
  // A valid print with one field spoiled.
  fc
    .tuple(fc.constantFrom(...Object.keys(buildPrint())), weirdValue)
    .map(([key, value]) => ({ ...buildPrint(), [key]: value })),
  fc.tuple(fc.nat(5), weirdValue).map(([index, value]) => {
    const print = buildPrint();
    return {
      ...print,
      processing: (print.processing ?? []).map((s, i) => (i === index ? value : s)),
    };
  }),
);

/** Text that is not JSON, or not quite, sent as application/json. */
export const malformedJson = fc.oneof(
  fc.string(),
  fc.constantFrom(
    '{',
    '{"email":',
    '[1,2',
    '{"a":1}}',
    'null',
    '"just a string"',
    '\u0000',
    '{"__proto__":{"x":1}}',
  ),
);

/** Path parameters: numbers that name nothing, words, encodings and overlong text. */
export const pathParam = fc.oneof(
  fc.string({ minLength: 1 }).map(encodeURIComponent),
  fc.integer({ min: -1e12, max: 1e12 }).map(String),
  fc.constantFrom(
    '0',
    '-1',
    '1.5',
    '1e3',
    '99999999999999999999',
    '%E0%A4%A',
    '..',
    'x'.repeat(2000),
    '%00',
  ),
);

const queryKeys = [
  'q',
  'process',
  'paperId',
  'fixingMinutesMin',
  'fixingMinutesMax',
  'washingMinutesMin',
  'washingMinutesMax',
  'toneStatus',
  'madeFrom',
  'madeTo',
  'processingRisk',
  'sort',
  'page',
  'pageSize',
  'deleted',
];

/** Query strings for the list: known keys with odd values, repeats, and raw junk. */
export const listQuery = fc.oneof(
  fc
    .array(
      fc.tuple(
        fc.constantFrom(...queryKeys),
        fc.oneof(
          fc.string(),
          fc.integer().map(String),
          fc.constantFrom('', '-1', '0', '1e9', 'true', 'yes', '2026-02-30', '9999-99-99'),
        ),
      ),
      { maxLength: 6 },
    )
    .map((pairs) => pairs.map(([k, v]) => `${k}=${encodeURIComponent(v)}`).join('&')),
  fc.string().map((text) => encodeURI(text)),
  fc.constantFrom('page[]=1', 'page[a]=1', 'sort=__proto__', 'q=%', 'pageSize=101', 'page=0'),
);
