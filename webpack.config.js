/**
 * Builds the add-in for the spreadsheet host into dist/: the worksheet functions bundle
 * (functions.js), their metadata (functions.json, generated from the JSDoc in
 * src/functions/functions.ts), the task pane page (taskpane.html, which also loads the
 * functions: one shared runtime) and the icons.
 *
 *   npm run build        production build into dist/
 *   npm run start:host   https dev server on port 3000 and sideloading into the desktop host
 *
 * Options (webpack --env): outDir=<folder> builds elsewhere (the metadata test uses this);
 * sideload registers the manifest with the desktop host once the server listens.
 */
const path = require("path");
const CopyWebpackPlugin = require("copy-webpack-plugin");
const CustomFunctionsMetadataPlugin = require("custom-functions-metadata-plugin");
const HtmlWebpackPlugin = require("html-webpack-plugin");
const { MetadataFlagsPlugin } = require("./src/build/metadataFlags");

const PORT = 3000;
const FUNCTIONS_SOURCE = path.resolve(__dirname, "src/functions/functions.ts");

/** Certificates trusted by the host, made (and installed) by office-addin-dev-certs on first use. */
async function httpsOptions() {
  const devCerts = require("office-addin-dev-certs");
  const { ca, key, cert } = await devCerts.getHttpsServerOptions();
  return { ca, key, cert };
}

/** The dev server of `npm run start:host`: https on localhost only (never the local network). */
function devServer(https, env = {}) {
  return {
    port: PORT,
    host: "localhost",
    server: { type: "https", options: https },
    headers: { "Access-Control-Allow-Origin": "*" },
    hot: false,
    liveReload: false,
    client: false,
    onListening: env.sideload ? () => require("./manifest/sideload").sideload() : undefined,
  };
}

module.exports = async (env = {}, argv = {}) => {
  const serving = Boolean(env.WEBPACK_SERVE);
  const mode = argv.mode || (serving ? "development" : "production");
  return {
    mode,
    context: __dirname,
    devtool: "source-map",
    entry: {
      functions: FUNCTIONS_SOURCE,
      taskpane: "./src/taskpane/taskpane.ts",
    },
    output: {
      path: path.resolve(__dirname, env.outDir || "dist"),
      filename: "[name].js",
      clean: true,
    },
    resolve: { extensions: [".ts", ".js"] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          // Type checking is `npm run typecheck`'s job; the bundle only needs the JavaScript.
          use: { loader: "ts-loader", options: { transpileOnly: true } },
        },
      ],
    },
    plugins: [
      new CustomFunctionsMetadataPlugin({ output: "functions.json", input: FUNCTIONS_SOURCE }),
      new MetadataFlagsPlugin("functions.json"),
      new HtmlWebpackPlugin({
        filename: "taskpane.html",
        template: "./src/taskpane/taskpane.html",
        chunks: ["functions", "taskpane"],
      }),
      new CopyWebpackPlugin({ patterns: [{ from: "assets/{icon-*.png,help.html}", to: "assets/[name][ext]" }] }),
    ],
    performance: { hints: false },
    devServer: serving ? devServer(await httpsOptions(), env) : undefined,
  };
};
module.exports.devServer = devServer;
