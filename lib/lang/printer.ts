import type { Expr, Program, Statement } from './ast';

/** Binding strength of each form; an operand weaker than its slot needs parentheses. */
function precedence(e: Expr): number {
  switch (e.kind) {
    case 'if':
      return 0;
    case 'binary':
      switch (e.op) {
        case 'or':
          return 1;
        case 'and':
          return 2;
        case '+':
        case '-':
          return 5;
        case '*':
        case '/':
          return 6;
        case '^':
          return 8;
        default:
          return 4;
      }
    case 'unary':
      return e.op === 'not' ? 3 : 7;
    default:
      return 9;
  }
}

function quote(text: string): string {
  return `"${text.replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`;
}

/** Source text of an expression, parenthesised just enough to parse back to the same tree. */
export function printExpr(e: Expr, slot = 0): string {
  const text = printBare(e);
  return precedence(e) < slot ? `(${text})` : text;
}

function printBare(e: Expr): string {
  switch (e.kind) {
    case 'number':
      return e.unit === null ? String(e.value) : `${e.value} ${e.unit}`;
    case 'text':
      return quote(e.value);
    case 'name':
      return e.name;
    case 'unary':
      return e.op === 'not' ? `not ${printExpr(e.operand, 3)}` : `-${printExpr(e.operand, 7)}`;
    case 'binary': {
      const p = precedence(e);
      if (e.op === '^') return `${printExpr(e.left, 9)} ^ ${printExpr(e.right, 7)}`;
      if (p === 4) return `${printExpr(e.left, 5)} ${e.op} ${printExpr(e.right, 5)}`;
      return `${printExpr(e.left, p)} ${e.op} ${printExpr(e.right, p + 1)}`;
    }
    case 'if':
      return `if ${printExpr(e.condition)} then ${printExpr(e.then)} else ${printExpr(e.otherwise)}`;
    case 'tuple':
      return `(${e.items.map((i) => printExpr(i)).join(', ')})`;
    case 'call':
      return `${e.callee}(${e.args.map((a) => (a.name ? `${a.name}: ${printExpr(a.value)}` : printExpr(a.value))).join(', ')})`;
    case 'invalid':
      return '(?)';
  }
}

export function printStatement(s: Statement): string {
  return s.kind === 'bind' ? `${s.name} = ${printExpr(s.value)}` : `${s.keyword} ${printExpr(s.value)}`;
}

/** The program as canonical source text, one statement per line. */
export function printProgram(p: Program): string {
  return p.statements.map(printStatement).join('\n') + '\n';
}
