/** Thrown for colour text a designer typed that we can't read; the message is meant to be shown as is. */
export class ColourInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "ColourInputError";
  }
}
