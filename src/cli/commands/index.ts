import { aheadCommand } from "./ahead";
import { backtestCommand } from "./backtest";
import type { BatchCommand } from "./batch";
import { bufferCommand } from "./buffer";
import { fitCommand } from "./fit";
import { statesCommand } from "./states";
import { watchCommand } from "./watch";

/** Every batch command, in the order of the program's help. Add a command here. */
export const BATCH_COMMANDS: readonly BatchCommand[] = [fitCommand, statesCommand, aheadCommand, backtestCommand, bufferCommand, watchCommand];

export function findCommand(name: string): BatchCommand {
  const command = BATCH_COMMANDS.find((c) => c.name === name);
  if (!command) throw new Error(`No batch command named ${name}`);
  return command;
}
