export interface CommandIo {
  stdout: NodeJS.WritableStream;
  stderr: NodeJS.WritableStream;
}

/** One `npx blockwright <name>` command. `run` returns the exit status; a thrown error becomes one line on stderr. */
export interface Command {
  name: string;
  summary: string;
  usage: string;
  run(args: string[], io: CommandIo): Promise<number>;
}
