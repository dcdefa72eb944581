import { z } from 'zod';
import { impossibleDateMessage } from '../domain/calendar';
import { formatNumber } from '../domain/format';

/**
 * Every validation message people can see, in our own words. Installed once as zod's global
 * error map (this module is imported by every shared schema file, so the server and the
 * browser both load it before any schema parses). A schema's own message still wins.
 */

type Issue = z.core.$ZodRawIssue;

const show = (value: number | bigint | Date): string =>
  value instanceof Date ? value.toISOString().slice(0, 10) : formatNumber(Number(value));

export const MESSAGES = {
  required: 'Fill this in.',
  number: 'Enter a number.',
  wholeNumber: 'Enter a whole number.',
  text: 'Enter text here.',
  yesNo: 'Choose yes or no.',
  date: 'Enter a date as YYYY-MM-DD.',
  list: 'Give a list here.',
  group: 'This part of the form is missing or not in the right shape.',
  choice: 'Choose one of the options offered.',
  email: 'Enter an email address, such as name@example.org.',
  link: 'Enter a web address starting with https://.',
  form: 'This is not in the form this field needs.',
  unknownField: 'This field is not one we know; leave it out.',
  entry: 'One of the entries here is not valid.',
  fallback: 'Check this value.',
} as const;

function wrongType(issue: Extract<Issue, { code: 'invalid_type' }>): string {
  if (issue.input === undefined || issue.input === null || issue.input === '') {
    return MESSAGES.required;
  }
  switch (issue.expected) {
    case 'number':
    case 'bigint':
      return MESSAGES.number;
    case 'int':
      return MESSAGES.wholeNumber;
    case 'string':
      return MESSAGES.text;
    case 'boolean':
      return MESSAGES.yesNo;
    case 'date':
      return MESSAGES.date;
    case 'array':
    case 'set':
    case 'tuple':
      return MESSAGES.list;
    case 'object':
    case 'record':
    case 'map':
      return MESSAGES.group;
    default:
      return MESSAGES.fallback;
  }
}

function tooSmall(issue: Extract<Issue, { code: 'too_small' }>): string {
  const min = show(issue.minimum);
  switch (issue.origin) {
    case 'string':
      return Number(issue.minimum) <= 1 ? MESSAGES.required : `Use at least ${min} characters.`;
    case 'array':
    case 'set':
      return Number(issue.minimum) <= 1 ? 'Choose at least one.' : `Choose at least ${min}.`;
    case 'date':
      return issue.inclusive ? `Use ${min} or later.` : `Use a date after ${min}.`;
    default:
      return issue.inclusive ? `Use ${min} or more.` : `Use a number above ${min}.`;
  }
}

function tooBig(issue: Extract<Issue, { code: 'too_big' }>): string {
  const max = show(issue.maximum);
  switch (issue.origin) {
    case 'string':
      return `Use at most ${max} characters.`;
    case 'array':
    case 'set':
      return `Choose at most ${max}.`;
    case 'date':
      return issue.inclusive ? `Use ${max} or earlier.` : `Use a date before ${max}.`;
    default:
      return issue.inclusive ? `Use ${max} or less.` : `Use a number below ${max}.`;
  }
}

function badFormat(issue: Extract<Issue, { code: 'invalid_format' }>): string {
  switch (issue.format) {
    case 'email':
      return MESSAGES.email;
    case 'url':
      return MESSAGES.link;
    case 'date':
      return impossibleDateMessage(issue.input) ?? MESSAGES.date;
    case 'datetime':
      return MESSAGES.date;
    default:
      return MESSAGES.form;
  }
}

/** Our message for one zod issue. */
export function ownMessage(issue: Issue): string {
  switch (issue.code) {
    case 'invalid_type':
      return wrongType(issue);
    case 'too_small':
      return tooSmall(issue);
    case 'too_big':
      return tooBig(issue);
    case 'invalid_format':
      return badFormat(issue);
    case 'not_multiple_of':
      return `Use a multiple of ${show(Number(issue.divisor))}.`;
    case 'invalid_value':
      return MESSAGES.choice;
    case 'unrecognized_keys':
      return MESSAGES.unknownField;
    case 'invalid_union':
      return MESSAGES.form;
    case 'invalid_key':
    case 'invalid_element':
      return MESSAGES.entry;
    default:
      return MESSAGES.fallback;
  }
}

z.config({ customError: ownMessage });
