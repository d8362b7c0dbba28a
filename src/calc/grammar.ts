/**
 * The calculator grammar: rules only.
 *
 *   calculation := sum (To Unit)?
 *   sum         := product ((Plus | Minus) product)*
 *   product     := unary ((Times | Divide) unary)*
 *   unary       := (Minus | Plus) unary | power
 *   power       := atom (Caret Minus? NumberLiteral)?
 *   atom        := quantity | ratio | FormulaMass | '(' sum ')'
 *   quantity    := NumberLiteral (PlusMinus NumberLiteral)? Unit?
 *   ratio       := Ratio Unit?            (1:1000, a ratio strength)
 */
import { CstParser } from 'chevrotain';
import { calcTokens, Caret, Divide, FormulaMass, LParen, Minus, NumberLiteral, Plus, PlusMinus, Ratio, RParen, Times, To, UnitToken } from './tokens.js';

export class CalcGrammar extends CstParser {
  constructor() {
    super(calcTokens, { recoveryEnabled: false, maxLookahead: 1, skipValidations: true });
    this.performSelfAnalysis();
  }

  public calculation = this.RULE('calculation', () => {
    this.SUBRULE(this.sum);
    this.OPTION(() => {
      this.CONSUME(To);
      this.CONSUME(UnitToken);
    });
  });

  public sum = this.RULE('sum', () => {
    this.SUBRULE(this.product);
    this.MANY(() => {
      this.OR([{ ALT: () => this.CONSUME(Plus) }, { ALT: () => this.CONSUME(Minus) }]);
      this.SUBRULE2(this.product);
    });
  });

  public product = this.RULE('product', () => {
    this.SUBRULE(this.unary);
    this.MANY(() => {
      this.OR([{ ALT: () => this.CONSUME(Times) }, { ALT: () => this.CONSUME(Divide) }]);
      this.SUBRULE2(this.unary);
    });
  });

  public unary = this.RULE('unary', () => {
    this.OR([
      {
        ALT: () => {
          this.OR2([{ ALT: () => this.CONSUME(Minus) }, { ALT: () => this.CONSUME(Plus) }]);
          this.SUBRULE(this.unary);
        },
      },
      { ALT: () => this.SUBRULE(this.power) },
    ]);
  });

  public power = this.RULE('power', () => {
    this.SUBRULE(this.atom);
    this.OPTION(() => {
      this.CONSUME(Caret);
      this.OPTION2(() => this.CONSUME(Minus));
      this.CONSUME(NumberLiteral);
    });
  });

  public atom = this.RULE('atom', () => {
    this.OR([
      { ALT: () => this.SUBRULE(this.quantity) },
      { ALT: () => this.SUBRULE(this.ratio) },
      { ALT: () => this.CONSUME(FormulaMass) },
      {
        ALT: () => {
          this.CONSUME(LParen);
          this.SUBRULE(this.sum);
          this.CONSUME(RParen);
        },
      },
    ]);
  });

  public quantity = this.RULE('quantity', () => {
    this.CONSUME(NumberLiteral);
    this.OPTION(() => {
      this.CONSUME(PlusMinus);
      this.CONSUME2(NumberLiteral);
    });
    this.OPTION2(() => this.CONSUME(UnitToken));
  });

  public ratio = this.RULE('ratio', () => {
    this.CONSUME(Ratio);
    this.OPTION(() => this.CONSUME(UnitToken));
  });
}

let instance: CalcGrammar | null = null;

/** The shared calculator grammar, built on first use. */
export function calcGrammar(): CalcGrammar {
  instance ??= new CalcGrammar();
  return instance;
}
