// Generated from the formula grammar (grammar.ts) by Chevrotain's generateCstDts: do not edit.
// tests/formula-parser/cst-types.test.ts checks it is current (UPDATE_CST_TYPES=1 rewrites it).
/* eslint-disable */
import type { CstNode, ICstVisitor, IToken } from "chevrotain";

export interface FormulaCstNode extends CstNode {
  name: "formula";
  children: FormulaCstChildren;
}

export type FormulaCstChildren = {
  body: BodyCstNode[];
  charge?: ChargeCstNode[];
};

export interface BodyCstNode extends CstNode {
  name: "body";
  children: BodyCstChildren;
}

export type BodyCstChildren = {
  component: (ComponentCstNode)[];
  Separator?: IToken[];
};

export interface ComponentCstNode extends CstNode {
  name: "component";
  children: ComponentCstChildren;
}

export type ComponentCstChildren = {
  Number?: IToken[];
  Fraction?: IToken[];
  part: PartCstNode[];
};

export interface PartCstNode extends CstNode {
  name: "part";
  children: PartCstChildren;
}

export type PartCstChildren = {
  atom?: AtomCstNode[];
  group?: GroupCstNode[];
  count?: CountCstNode[];
};

export interface AtomCstNode extends CstNode {
  name: "atom";
  children: AtomCstChildren;
}

export type AtomCstChildren = {
  IsotopeLabel?: IToken[];
  Abbreviation?: IToken[];
  SuperscriptDigits?: IToken[];
  Word?: IToken[];
};

export interface GroupCstNode extends CstNode {
  name: "group";
  children: GroupCstChildren;
}

export type GroupCstChildren = {
  LParen?: IToken[];
  body?: (BodyCstNode)[];
  RParen?: IToken[];
  LSquare?: IToken[];
  RSquare?: IToken[];
  LCurly?: IToken[];
  RCurly?: IToken[];
};

export interface CountCstNode extends CstNode {
  name: "count";
  children: CountCstChildren;
}

export type CountCstChildren = {
  Number?: IToken[];
  SubscriptDigits?: IToken[];
};

export interface ChargeCstNode extends CstNode {
  name: "charge";
  children: ChargeCstChildren;
}

export type ChargeCstChildren = {
  CaretCharge?: IToken[];
  SuperscriptCharge?: IToken[];
  Sign?: IToken[];
};

export interface FormulaCstVisitor<IN, OUT> extends ICstVisitor<IN, OUT> {
  formula(children: FormulaCstChildren, param?: IN): OUT;
  body(children: BodyCstChildren, param?: IN): OUT;
  component(children: ComponentCstChildren, param?: IN): OUT;
  part(children: PartCstChildren, param?: IN): OUT;
  atom(children: AtomCstChildren, param?: IN): OUT;
  group(children: GroupCstChildren, param?: IN): OUT;
  count(children: CountCstChildren, param?: IN): OUT;
  charge(children: ChargeCstChildren, param?: IN): OUT;
}
