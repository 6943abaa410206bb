// Hand-calc typesetting for formulas and checks, free of any page code so the
// record export can use it in Node.

export { nameTex, textTex } from './names';
export { numberTex, unitTex, quantityTex, needsBrackets } from './quantity';
export { formulaTex, exprTex, parseForDisplay, type FormulaTex, type HandCalcScope } from './formula';
export { checkTex, checkSymbol, ratioText, type CheckTex } from './check';
