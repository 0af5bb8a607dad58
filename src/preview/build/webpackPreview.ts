/**
 * Webpack configuration of the preview page (`npm start`). It lives here, not at the top level,
 * because the top-level webpack.config.js builds the add-in for the spreadsheet host.
 */
import HtmlWebpackPlugin from "html-webpack-plugin";
import { resolve } from "path";
import webpack from "webpack";
import { DEMO_NOTICE } from "../demo/generate-demo";

export const REPO_ROOT = resolve(__dirname, "../../..");
/** Built page; `build/` is gitignored. */
export const PREVIEW_OUT = resolve(REPO_ROOT, "build/preview");

export function previewWebpackConfig(mode: "development" | "production" = "development"): webpack.Configuration {
  return {
    mode,
    context: REPO_ROOT,
    entry: { preview: resolve(__dirname, "../page/main.ts") },
    output: { path: PREVIEW_OUT, filename: "[name].js", clean: true },
    devtool: mode === "development" ? "source-map" : false,
    resolve: { extensions: [".ts", ".js", ".mjs"] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: {
            loader: "ts-loader",
            // Type checking is `npm run typecheck`'s job; the preview build only transpiles, so it
            // stays quick on a small machine.
            options: { transpileOnly: true, compilerOptions: { module: "es2020", sourceMap: mode === "development" } },
          },
        },
        // The committed demo CSV is bundled as text and parsed in the page.
        { test: /\.csv$/, type: "asset/source" },
        { test: /\.css$/, type: "asset/source" },
      ],
    },
    plugins: [
      new webpack.DefinePlugin({ EBB_DEMO_NOTICE: JSON.stringify(DEMO_NOTICE) }),
      new HtmlWebpackPlugin({ template: resolve(__dirname, "../page/index.html"), filename: "index.html", inject: "body" }),
    ],
    performance: { hints: false },
    stats: "errors-warnings",
    infrastructureLogging: { level: "warn" },
  };
}
