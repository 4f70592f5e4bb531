// The one error Heatpath's coolant computations throw for input a person must correct. `field`
// names the option at fault so a form can put the message beside the right box.
export class CoolantInputError extends Error {
  override readonly name = 'CoolantInputError';
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    this.field = field;
  }
}
