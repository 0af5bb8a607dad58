/**
 * Adds the flags the custom-functions metadata plugin cannot write to the emitted
 * functions.json (webpack step, after that plugin):
 *
 * - allowErrorForDataTypeAny: without it the host never passes an error cell (#DIV/0!, #N/A)
 *   to a parameter of type any and shows its own error instead, so Ebb's message naming the
 *   cell never appears. (The platform's "Manually create JSON metadata for custom functions"
 *   page documents the top-level flag.)
 * - allowCustomDataForDataTypeAny: cells holding data types (formatted numbers, entities)
 *   arrive as objects; src/functions/coerce.ts reads their basic value.
 */
const FLAGS = { allowErrorForDataTypeAny: true, allowCustomDataForDataTypeAny: true };

class MetadataFlagsPlugin {
  constructor(file = "functions.json") {
    this.file = file;
  }

  apply(compiler) {
    const { Compilation, sources } = compiler.webpack;
    compiler.hooks.thisCompilation.tap("MetadataFlagsPlugin", (compilation) => {
      compilation.hooks.processAssets.tap(
        { name: "MetadataFlagsPlugin", stage: Compilation.PROCESS_ASSETS_STAGE_REPORT },
        () => {
          const asset = compilation.getAsset(this.file);
          if (!asset) {
            compilation.errors.push(new Error(`${this.file} was not emitted; the metadata flags cannot be added.`));
            return;
          }
          const metadata = JSON.parse(asset.source.source().toString());
          const flagged = { ...FLAGS, ...metadata, ...FLAGS };
          compilation.updateAsset(this.file, new sources.RawSource(JSON.stringify(flagged, null, 2)));
        },
      );
    });
  }
}

module.exports = { MetadataFlagsPlugin, FLAGS };
