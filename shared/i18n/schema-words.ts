/**
 * The words the request schemas (shared/schemas) give a field's problem — `"messages"` beside a
 * keyword, and the `description` of a pattern a person may break — in the reader's language. The
 * schemas are data in the source language; the server's validation and the app's forms pass
 * their words through `schemaWords`, so a refusal reads in Spanish on a Spanish screen.
 * `tests/tooling/schema-words.spec.ts` fails when a schema gains words that are not here.
 */
import './localize';

const WORDS: Readonly<Record<string, () => string>> = {
  'can have at most 120 characters': () =>
    $localize`:a field's problem, after the field's name:can have at most 120 characters`,
  'can have at most 200 characters': () =>
    $localize`:a field's problem, after the field's name:can have at most 200 characters`,
  'can have at most 35 characters': () =>
    $localize`:a field's problem, after the field's name:can have at most 35 characters`,
  'can hold at most 8 activities: take one off before pinning another': () =>
    $localize`:a field's problem, after the field's name:can hold at most 8 activities: take one off before pinning another`,
  'is needed': () => $localize`:a field's problem, after the field's name:is needed`,
  'is needed: the list of activities to pin (it may be empty)': () =>
    $localize`:a field's problem, after the field's name:is needed: the list of activities to pin (it may be empty)`,
  'is not a calendar address': () =>
    $localize`:a field's problem, after the field's name:is not a calendar address`,
  "is not an activity's id (small letters, digits and dashes, as the activity library shows them)": () =>
    $localize`:a field's problem, after the field's name:is not an activity's id (small letters, digits and dashes, as the activity library shows them)`,
  'is not something a pin can have': () =>
    $localize`:a field's problem, after the field's name:is not something a pin can have`,
  "is too long for an activity's id": () =>
    $localize`:a field's problem, after the field's name:is too long for an activity's id`,
  'minutes late can be at most 240': () =>
    $localize`:a field's problem, after the field's name:minutes late can be at most 240`,
  'minutes late must be a whole number': () =>
    $localize`:a field's problem, after the field's name:minutes late must be a whole number`,
  'minutes late must be at least 1': () =>
    $localize`:a field's problem, after the field's name:minutes late must be at least 1`,
  'minutes left early can be at most 240': () =>
    $localize`:a field's problem, after the field's name:minutes left early can be at most 240`,
  'minutes left early must be a whole number': () =>
    $localize`:a field's problem, after the field's name:minutes left early must be a whole number`,
  'minutes left early must be at least 1': () =>
    $localize`:a field's problem, after the field's name:minutes left early must be at least 1`,
  'must be Celsius or Fahrenheit': () =>
    $localize`:a field's problem, after the field's name:must be Celsius or Fahrenheit`,
  'must be Celsius or Fahrenheit, or empty to follow the club': () =>
    $localize`:a field's problem, after the field's name:must be Celsius or Fahrenheit, or empty to follow the club`,
  'must be a date': () => $localize`:a field's problem, after the field's name:must be a date`,
  'must be a language tag such as en-GB': () =>
    $localize`:a field's problem, after the field's name:must be a language tag such as en-GB`,
  'must be a list of activities': () =>
    $localize`:a field's problem, after the field's name:must be a list of activities`,
  'must be a time such as 18:30': () =>
    $localize`:a field's problem, after the field's name:must be a time such as 18:30`,
  'must be a whole number of days': () =>
    $localize`:a field's problem, after the field's name:must be a whole number of days`,
  'must be a whole number of minutes': () =>
    $localize`:a field's problem, after the field's name:must be a whole number of minutes`,
  'must be a whole number of seasons from 1 to 10': () =>
    $localize`:a field's problem, after the field's name:must be a whole number of seasons from 1 to 10`,
  "must be an activity's id": () =>
    $localize`:a field's problem, after the field's name:must be an activity's id`,
  'must be an object with the list of activities to pin': () =>
    $localize`:a field's problem, after the field's name:must be an object with the list of activities to pin`,
  'must be at least 1': () => $localize`:a field's problem, after the field's name:must be at least 1`,
  'must be at least 5 minutes': () =>
    $localize`:a field's problem, after the field's name:must be at least 5 minutes`,
  'must be at most 120 characters': () =>
    $localize`:a field's problem, after the field's name:must be at most 120 characters`,
  'must be at most 120 minutes': () =>
    $localize`:a field's problem, after the field's name:must be at most 120 minutes`,
  'must be at most 366': () => $localize`:a field's problem, after the field's name:must be at most 366`,
  'must be metres or yards': () =>
    $localize`:a field's problem, after the field's name:must be metres or yards`,
  'must be metres or yards, or empty to follow the club': () =>
    $localize`:a field's problem, after the field's name:must be metres or yards, or empty to follow the club`,
  'must be text': () => $localize`:a field's problem, after the field's name:must be text`,
  'must be training or match': () =>
    $localize`:a field's problem, after the field's name:must be training or match`,
  'must name an activity': () => $localize`:a field's problem, after the field's name:must name an activity`,
  'needs at least 12 characters': () =>
    $localize`:a field's problem, after the field's name:needs at least 12 characters`,
  'say what to change': () => $localize`:a field's problem, after the field's name:say what to change`,
  'say which unit to change': () =>
    $localize`:a field's problem, after the field's name:say which unit to change`,
  'say who came': () => $localize`:a field's problem, after the field's name:say who came`,
  'send the players who came once': () =>
    $localize`:a field's problem, after the field's name:send the players who came once`,
  'must not be only spaces.': () =>
    $localize`:how a field is written, after the field's name:must not be only spaces.`,
  'A first name and initial; no digits, e-mail addresses or markup.': () =>
    $localize`:how a field is written, after the field's name:A first name and initial; no digits, e-mail addresses or markup.`,
  'HH:MM, 24-hour': () => $localize`:how a field is written, after the field's name:HH:MM, 24-hour`,
  'HH:MM, 24-hour, local time': () =>
    $localize`:how a field is written, after the field's name:HH:MM, 24-hour, local time`,
};

/** The schema's words in the reader's language; words it does not know stay as written. */
export function schemaWords(text: string): string {
  return Object.hasOwn(WORDS, text) ? WORDS[text]!() : text;
}

/** Every schema word this file translates (for the check that none is missing). */
export const SCHEMA_WORDS: readonly string[] = Object.keys(WORDS);
