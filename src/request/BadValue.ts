/**
 * A parameter value that does not parse, with what was expected. Thrown by the value parsers, which do
 * not know the parameter's name; readRequest turns it into a ParameterError naming the parameter, and
 * the CLI into commander's InvalidArgumentError (so commander names the option).
 */
export class BadValue extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'BadValue';
  }
}
