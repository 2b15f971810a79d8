import { readFileSync } from 'node:fs';
import { calculatorByName } from '@shared/calc/index';
import { isCalculatorName } from '@shared/calc/names';
import type { CalculatorExample } from '@shared/schemas/content';
import type { ContentProblem } from './content-loader';

/** A calculator directive found in a lesson body, with the file line it sits on. */
export interface EmbeddedCalculator {
  name: string;
  line: number;
}

const NUMBER = /^-?\d+(?:\.(\d+))?$/;

/** The value at a dotted path ("radiiMm.0", "solutions.0.fraction") inside a result, or undefined. */
function at(value: unknown, path: string): unknown {
  return path.split('.').reduce<unknown>((v, key) => {
    if (v === null || typeof v !== 'object') return undefined;
    return Object.hasOwn(v, key) ? (v as Record<string, unknown>)[key] : undefined;
  }, value);
}

/**
 * Why a computed value does not read as the lesson's figure, or null when it does. A number must round to the figure
 * at the decimals the lesson writes ("0.040" is checked to 0.0005); words and yes/no must match exactly.
 */
function mismatch(computed: unknown, shown: string | number | boolean): string | null {
  const text = String(shown);
  const numeric = NUMBER.exec(text);
  if (typeof shown !== 'boolean' && numeric) {
    if (typeof computed !== 'number' || !Number.isFinite(computed)) return `gives ${JSON.stringify(computed)}`;
    const decimals = numeric[1]?.length ?? 0;
    const halfStep = 0.5 * 10 ** -decimals;
    return Math.abs(computed - Number(text)) <= halfStep * (1 + 1e-9)
      ? null
      : `gives ${computed.toFixed(decimals + 2)}`;
  }
  return String(computed) === text ? null : `gives ${JSON.stringify(computed)}`;
}

/**
 * Lesson text with digit groups closed up ("9 549" → "9549") and typeset minus signs made plain ("−1.08" → "-1.08"),
 * so a figure can be found however it is printed.
 */
// Lower case too, because a lesson writes "red brown" where the calculator's table says "Red brown".
const plainFigures = (body: string) => body.replace(/(\d)[\s\u2009\u202f](?=\d{3}\b)/g, '$1').replace(/\u2212/g, '-');

/** The line of the `calculatorExamples:` key, so problems with an example point into the front matter. */
function examplesLine(file: string): number {
  const index = readFileSync(file, 'utf8')
    .split('\n')
    .findIndex((l) => l.startsWith('calculatorExamples:'));
  return index + 1 || 1;
}

/**
 * Each worked example is run through its calculator and must agree with the lesson; each embedded calculator must
 * have at least one, so that no lesson shows figures the calculator would not give.
 */
export function checkCalculatorExamples(
  lesson: { file: string; body: string; examples: CalculatorExample[] },
  embedded: EmbeddedCalculator[],
  problems: ContentProblem[],
): void {
  const line = lesson.examples.length > 0 ? examplesLine(lesson.file) : 1;
  const report = (message: string) => problems.push({ file: lesson.file, line, message });
  const text = plainFigures(lesson.body);
  lesson.examples.forEach((example, i) => {
    const where = `calculator example ${i + 1} (${example.calculator})`;
    if (!isCalculatorName(example.calculator))
      return report(`${where}: there is no calculator "${example.calculator}"`);
    const calculator = calculatorByName(example.calculator);
    const parsed = calculator.inputSchema.safeParse(example.inputs);
    if (!parsed.success) {
      const issues = parsed.error.issues.map((x) => `${x.path.join('.') || '(inputs)'}: ${x.message}`);
      return report(`${where}: the inputs are not valid: ${issues.join('; ')}`);
    }
    const { results } = calculator.compute(example.inputs);
    for (const [path, shown] of Object.entries(example.shows)) {
      const computed = at(results, path);
      if (computed === undefined) {
        report(`${where}: the calculator has no result "${path}"`);
        continue;
      }
      const wrong = mismatch(computed, shown);
      if (wrong) report(`${where}: the lesson shows ${path} = ${String(shown)} but the calculator ${wrong}`);
      else if (typeof shown !== 'boolean' && !text.toLowerCase().includes(String(shown).toLowerCase())) {
        report(`${where}: ${path} = ${String(shown)} is checked but the lesson's text never shows that figure`);
      }
    }
  });
  const exemplified = new Set(lesson.examples.map((e) => e.calculator));
  for (const directive of embedded) {
    if (!exemplified.has(directive.name)) {
      problems.push({
        file: lesson.file,
        line: directive.line,
        message: `calculator "${directive.name}" is embedded but calculatorExamples gives no worked example for it, so its figures cannot be checked`,
      });
    }
  }
}
