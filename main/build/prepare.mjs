// The `prepare` script (npm install, npm ci): builds the command's bundle (build-cli.ts). A failure
// here must not fail the install (an install without dev dependencies has no esbuild or tsx): the
// command then runs from its sources, so this only says so.

try {
  const { register } = await import('tsx/esm/api');
  register();
  const { buildCli, CLI_OUT_DIR } = await import('./build-cli.ts');
  const { manifest } = await buildCli();
  process.stdout.write(`prepare: built the lanewright command into ${CLI_OUT_DIR} from ${manifest.inputs.length} source files\n`);
} catch (error) {
  process.stderr.write(`prepare: the lanewright command was not bundled (${error instanceof Error ? error.message : String(error)}); it will run from its sources\n`);
}
