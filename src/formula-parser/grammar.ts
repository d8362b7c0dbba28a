/**
 * The formula grammar: rules only, no actions. The CST it builds is turned into
 * a typed tree by visitor.ts.
 *
 *   formula   := body charge?
 *   body      := component (Separator component)*
 *   component := (Number | Fraction)? part+
 *   part      := (atom | group) count?
 *   atom      := IsotopeLabel | Abbreviation | SuperscriptDigits? Word
 *   group     := '(' body ')' | '[' body ']' | '{' body '}'
 *   count     := Number | SubscriptDigits
 *   charge    := CaretCharge | SuperscriptCharge | Sign
 */
import { CstParser } from 'chevrotain';
import {
  Abbreviation,
  allTokens,
  CaretCharge,
  Fraction,
  IsotopeLabel,
  LCurly,
  LParen,
  LSquare,
  NumberToken,
  RCurly,
  RParen,
  RSquare,
  Separator,
  Sign,
  SubscriptDigits,
  SuperscriptCharge,
  SuperscriptDigits,
  Word,
} from './tokens.js';

export class FormulaGrammar extends CstParser {
  constructor() {
    super(allTokens, { recoveryEnabled: false, maxLookahead: 1, skipValidations: true });
    this.performSelfAnalysis();
  }

  public formula = this.RULE('formula', () => {
    this.SUBRULE(this.body);
    this.OPTION(() => this.SUBRULE(this.charge));
  });

  public body = this.RULE('body', () => {
    this.SUBRULE(this.component);
    this.MANY(() => {
      this.CONSUME(Separator);
      this.SUBRULE2(this.component);
    });
  });

  public component = this.RULE('component', () => {
    this.OPTION(() => this.OR([{ ALT: () => this.CONSUME(NumberToken) }, { ALT: () => this.CONSUME(Fraction) }]));
    this.AT_LEAST_ONE(() => this.SUBRULE(this.part));
  });

  public part = this.RULE('part', () => {
    this.OR([{ ALT: () => this.SUBRULE(this.atom) }, { ALT: () => this.SUBRULE(this.group) }]);
    this.OPTION(() => this.SUBRULE(this.count));
  });

  public atom = this.RULE('atom', () => {
    this.OR([
      { ALT: () => this.CONSUME(IsotopeLabel) },
      { ALT: () => this.CONSUME(Abbreviation) },
      {
        ALT: () => {
          this.OPTION(() => this.CONSUME(SuperscriptDigits));
          this.CONSUME(Word);
        },
      },
    ]);
  });

  public group = this.RULE('group', () => {
    this.OR([
      {
        ALT: () => {
          this.CONSUME(LParen);
          this.SUBRULE(this.body);
          this.CONSUME(RParen);
        },
      },
      {
        ALT: () => {
          this.CONSUME(LSquare);
          this.SUBRULE2(this.body);
          this.CONSUME(RSquare);
        },
      },
      {
        ALT: () => {
          this.CONSUME(LCurly);
          this.SUBRULE3(this.body);
          this.CONSUME(RCurly);
        },
      },
    ]);
  });

  public count = this.RULE('count', () => {
    this.OR([{ ALT: () => this.CONSUME(NumberToken) }, { ALT: () => this.CONSUME(SubscriptDigits) }]);
  });

  public charge = this.RULE('charge', () => {
    this.OR([{ ALT: () => this.CONSUME(CaretCharge) }, { ALT: () => this.CONSUME(SuperscriptCharge) }, { ALT: () => this.CONSUME(Sign) }]);
  });
}

let instance: FormulaGrammar | null = null;

/**
 * The shared grammar instance, built on first use (building it costs a few milliseconds).
 *
 * @example
 * formulaGrammar() === formulaGrammar() // true (one shared instance)
 */
export function formulaGrammar(): FormulaGrammar {
  instance ??= new FormulaGrammar();
  return instance;
}
