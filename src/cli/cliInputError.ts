/** Invalid input or usage: exit code 2, messages on stderr, nothing on stdout, no file written. */
export class CliInputError extends Error {
  readonly messages: string[];
  constructor(headline: string, messages: string[] = []) {
    super(headline);
    this.name = 'CliInputError';
    this.messages = messages;
  }
}
