/** Builds the preview page with webpack's Node API; resolves with the output folder. */
import webpack from "webpack";
import { PREVIEW_OUT, previewWebpackConfig } from "./webpackPreview";

export function buildPreview(mode: "development" | "production" = "development"): Promise<string> {
  return new Promise((resolvePromise, reject) => {
    webpack(previewWebpackConfig(mode), (err, stats) => {
      if (err) return reject(err);
      if (!stats) return reject(new Error("webpack returned no build result."));
      if (stats.hasErrors()) {
        return reject(new Error(`The preview page did not build:\n${stats.toString({ all: false, errors: true, colors: false })}`));
      }
      if (stats.hasWarnings()) console.warn(stats.toString({ all: false, warnings: true, colors: false }));
      resolvePromise(PREVIEW_OUT);
    });
  });
}
