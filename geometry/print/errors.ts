/** Thrown when a print request cannot be laid out; `code` says why, the message says what to change. */
export type PrintErrorCode = 'bad-paper' | 'bad-margin' | 'bad-overlap' | 'bad-layout' | 'bad-size' | 'too-large';

export class PrintError extends Error {
  override readonly name = 'PrintError';
  constructor(
    readonly code: PrintErrorCode,
    message: string,
  ) {
    super(message);
  }
}
