// The part of papaparse's API that shared/ uses, typed here: the published types pull in Node's,
// which shared/ compiles without (it runs in the browser too). shared/tsconfig.json includes this file.
declare module 'papaparse' {
  export type ParseConfig = { delimiter?: string; delimitersToGuess?: string[]; skipEmptyLines?: boolean | 'greedy'; comments?: false | string };
  export type ParseError = { type: string; code: string; message: string; row?: number };
  export type ParseResult = { data: string[][]; errors: ParseError[]; meta: { delimiter: string; linebreak: string } };
  const Papa: { parse(input: string, config?: ParseConfig): ParseResult };
  export default Papa;
}
