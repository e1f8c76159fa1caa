/** What is wrong with a row, as a code the screen words (figures.import.problem.<code>) with the file's value. */
export const ROW_PROBLEMS = {
  noId: 'The record has no id.',
  idTooLong: 'The id is longer than 80 characters.',
  providerTooLong: 'The data provider is longer than 80 characters.',
  idTwice: 'The id {value} appears twice in this file.',
  notDate: '"{value}" is not a date written as YYYY-MM-DD.',
  futureDate: '{value} is in the future.',
  unknownStatus: '"{value}" is not a repair status we know.',
  unknownBarrier: '"{value}" is not a reason we know.',
  unknownCategory: '"{value}" is not a product category of the standard.',
  notAge: '"{value}" is not an age in years.',
  notYear: '"{value}" is not a year.',
  noGroup: 'The record names no group.',
} as const;
export type RowProblem = keyof typeof ROW_PROBLEMS;
