import { InputError } from '../errors';

/**
 * A budget file that cannot be read at all: bad JSON, a limit exceeded, a
 * forbidden or unknown key, a wrong shape, an unreadable version. The whole
 * file is refused; `path` points at the first problem inside it (in the
 * document's own terms, `sensors[2].sources[1].value`) and the message
 * starts with the file name so a user with several files open knows which.
 */
export class BudgetFileError extends InputError {
  /** The name the caller gave for the text (a file name or a tab title). */
  readonly fileName: string;

  constructor(fileName: string, path: string, message: string) {
    super(path, message);
    this.name = 'BudgetFileError';
    this.fileName = fileName;
    // The base class already joined path and message; the file goes in front.
    this.message = `${fileName}: ${this.message}`;
  }
}
