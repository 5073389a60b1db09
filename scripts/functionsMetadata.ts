/**
 * Generates the worksheet-function metadata from the JSDoc in src/functions/functions.ts
 * (custom-functions-metadata), the one source every host registers from:
 *
 * - src/functions/metadata.json      what Excel loads (served as functions.json);
 * - src/functions/associations.json  function id → exported JavaScript name.
 *
 * It refuses ids and names that break Excel's naming rules (src/functions/namingRules.ts).
 *
 *   npx tsx scripts/functionsMetadata.ts           write both files
 *   npx tsx scripts/functionsMetadata.ts --check   exit 1 if either is stale
 */
import { readFileSync, writeFileSync } from 'fs';
import { join } from 'path';
import { generateCustomFunctionsMetadata } from 'custom-functions-metadata';
import { NAMING_RULES_SOURCE, namingProblems } from '../src/functions/namingRules';

const ROOT = join(__dirname, '..');
export const CATALOG_SOURCE = join(ROOT, 'src/functions/functions.ts');
export const METADATA_FILE = join(ROOT, 'src/functions/metadata.json');
export const ASSOCIATIONS_FILE = join(ROOT, 'src/functions/associations.json');

/** The two generated files' contents, as text. */
export async function generateMetadataFiles(): Promise<{ metadata: string; associations: string }> {
  const result = await generateCustomFunctionsMetadata(CATALOG_SOURCE);
  if (result.errors.length > 0) throw new Error(`custom-functions-metadata reported:\n${result.errors.join('\n')}`);
  const parsed = JSON.parse(result.metadataJson) as { functions: { id: string; name: string }[] };
  const problems = parsed.functions.flatMap((f) => namingProblems(f.id, f.name));
  if (problems.length > 0) throw new Error(`Function names break Excel's naming rules (${NAMING_RULES_SOURCE}):\n${problems.join('\n')}`);
  const metadata = JSON.stringify(parsed, null, 2) + '\n';
  const associations =
    JSON.stringify(
      result.associate.map((a) => ({ id: a.id, functionName: a.functionName })),
      null,
      2,
    ) + '\n';
  return { metadata, associations };
}

async function main(): Promise<void> {
  const { metadata, associations } = await generateMetadataFiles();
  if (process.argv.includes('--check')) {
    const stale = [
      [METADATA_FILE, metadata],
      [ASSOCIATIONS_FILE, associations],
    ].filter(([file, text]) => readFileSync(file, 'utf8') !== text);
    for (const [file] of stale) console.error(`${file} is stale: run npm run metadata`);
    process.exitCode = stale.length > 0 ? 1 : 0;
    return;
  }
  writeFileSync(METADATA_FILE, metadata);
  writeFileSync(ASSOCIATIONS_FILE, associations);
  console.log(`Wrote ${METADATA_FILE} and ${ASSOCIATIONS_FILE}.`);
}

if (require.main === module) {
  main().catch((e) => {
    console.error(e instanceof Error ? e.message : e);
    process.exitCode = 1;
  });
}
