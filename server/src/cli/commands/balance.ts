/**
 * `lonepair balance [--json] [--acidic | --basic] <equation...>`: each equation with the smallest
 * whole-number coefficients that conserve every element and the charge; with `--acidic` or
 * `--basic`, a half-reaction or skeleton redox equation is completed with H+ (or OH-), H2O and
 * electrons first. Exit 0 when every equation was balanced, 1 when any could not be (or has no
 * single answer), 2 on a usage error.
 */
import { balanceInSolution, balanceText, type SolutionBalanceAnswer, type SolutionMedium } from "../../../../shared/src/index";
import type { CliCommand, CliIo } from "../cliCommand";
import { EXIT_FAILURE, EXIT_OK, parseCommandLine, usageError } from "../cliCommand";
import { terminalSafe } from "../terminalText";

const HELP = `Usage: lonepair balance [--json] [--acidic | --basic] <equation...>

Balances each equation: reactants and products written as formulas with + between them
and an arrow (->, →, <=>, ⇌, or an mhchem span such as \\ce{Al + O2 -> Al2O3}).
Coefficients may be whole numbers, fractions (1/2 O2) or decimals; electrons are e-.
Quote each equation. Only the coefficients are changed; a 1 is left out.

Options:
  --acidic  complete a half-reaction or skeleton redox equation in acidic solution:
            add H+ and H2O where needed, and electrons (e-) to a half-reaction
  --basic   the same in basic solution, with OH- and H2O
  --json    print a JSON array, one object per equation: input, ok, equation,
            coefficients (in the order the species are written), wasBalanced; or
            input, ok: false and error { code, message }; completedIn ("acidic"
            or "basic") when species were added
  --help    show this help

Exit status: 0 every equation balanced, 1 any equation not balanced, 2 usage error.
`;

export const balanceCommand: CliCommand = {
  name: "balance",
  summary: "balance each equation given with the smallest whole-number coefficients",
  help: HELP,
  run: runBalance,
};

function runBalance(args: readonly string[], io: CliIo): number {
  const parsed = parseCommandLine(balanceCommand, args, io, {
    json: { type: "boolean" },
    acidic: { type: "boolean" },
    basic: { type: "boolean" },
  });
  if (parsed.exit !== undefined) return parsed.exit;
  if (parsed.positionals.length === 0) return usageError(balanceCommand, io, "give at least one equation.");
  if (parsed.values.acidic && parsed.values.basic) return usageError(balanceCommand, io, "choose --acidic or --basic, not both.");
  const medium: SolutionMedium | undefined = parsed.values.acidic ? "acidic" : parsed.values.basic ? "basic" : undefined;
  const answers: SolutionBalanceAnswer[] = parsed.positionals.map((input) =>
    medium ? balanceInSolution(input, medium) : balanceText(input),
  );
  const failures = answers.filter((answer) => !answer.ok).length;
  if (parsed.values.json) io.writeOut(JSON.stringify(answers.map(jsonOf), null, 2) + "\n");
  else io.writeOut(answers.map(lineOf).join(""));
  return failures === 0 ? EXIT_OK : EXIT_FAILURE;
}

function jsonOf(answer: SolutionBalanceAnswer): object {
  if (!answer.ok) return { input: answer.input, ok: false, error: answer.error };
  const { input, equation, coefficients, wasBalanced, completedIn } = answer;
  return completedIn
    ? { input, ok: true, equation, coefficients, wasBalanced, completedIn }
    : { input, ok: true, equation, coefficients, wasBalanced };
}

function lineOf(answer: SolutionBalanceAnswer): string {
  if (!answer.ok) return `${terminalSafe(answer.input)}: not balanced: ${terminalSafe(answer.error.message)} [${answer.error.code}]\n`;
  const note = answer.wasBalanced
    ? "    (already balanced)"
    : answer.completedIn
      ? `    (completed in ${answer.completedIn} solution)`
      : "";
  return `${terminalSafe(answer.equation)}${note}\n`;
}
