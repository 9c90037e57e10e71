// Webpack build for the Plumbline add-in.
//
// Exported as a function so callers (webpack-cli `--env outputPath=...`, or the
// build test) can redirect output without clobbering dist/.
const fs = require("node:fs");
const os = require("node:os");
const path = require("node:path");
const HtmlWebpackPlugin = require("html-webpack-plugin");
const CopyWebpackPlugin = require("copy-webpack-plugin");
const CustomFunctionsMetadataPlugin = require("custom-functions-metadata-plugin");

const FUNCTIONS_SOURCE = path.resolve(__dirname, "src/functions/functions.ts");

// Office only loads add-ins over https. office-addin-dev-certs writes trusted
// localhost certificates here (`npx office-addin-dev-certs install`); without
// them we fall back to http so the server still starts for plain browser work.
function devServerTransport() {
  const dir = path.join(os.homedir(), ".office-addin-dev-certs");
  const files = { key: "localhost.key", cert: "localhost.crt", ca: "ca.crt" };
  const present = Object.values(files).every((f) => fs.existsSync(path.join(dir, f)));
  if (!present) return "http";
  const options = {};
  for (const [k, f] of Object.entries(files)) options[k] = fs.readFileSync(path.join(dir, f));
  return { type: "https", options };
}

module.exports = (env = {}, argv = {}) => {
  const mode = argv.mode || "production";
  const outputPath = env.outputPath ? path.resolve(env.outputPath) : path.resolve(__dirname, "dist");

  return {
    mode,
    context: __dirname,
    devtool: mode === "development" ? "source-map" : false,
    entry: {
      taskpane: "./src/taskpane/index.tsx",
      functions: "./src/functions/functions.ts",
      preview: "./src/preview/index.tsx",
    },
    output: {
      path: outputPath,
      // No content hashes: manifest.xml refers to functions.js by a fixed name.
      filename: "[name].js",
      clean: true,
    },
    // One runtime and one copy of the engine for every page: in the shared runtime the cell
    // functions and the pane then use the very same fit cache, so they can never disagree.
    optimization: {
      runtimeChunk: "single",
      splitChunks: {
        cacheGroups: {
          engine: { test: /[\\/]src[\\/]engine[\\/]|[\\/]node_modules[\\/]@stdlib[\\/]/, name: "engine", chunks: "all", enforce: true },
        },
      },
    },
    resolve: {
      extensions: [".ts", ".tsx", ".js"],
    },
    module: {
      rules: [
        {
          test: /\.tsx?$/,
          exclude: /node_modules/,
          use: {
            loader: "ts-loader",
            // Type checking is `tsc --noEmit -p .` in `npm test`; the bundle only transpiles.
            options: { transpileOnly: true, compilerOptions: { noEmit: false } },
          },
        },
      ],
    },
    plugins: [
      new CustomFunctionsMetadataPlugin({ input: FUNCTIONS_SOURCE, output: "functions.json" }),
      // Shared runtime: Excel loads this single page for the pane AND the cell
      // functions, so it must carry both bundles, functions first so the
      // cell functions are registered before any pane code runs.
      new HtmlWebpackPlugin({
        filename: "taskpane.html",
        template: "./src/taskpane/taskpane.html",
        chunks: ["functions", "taskpane"],
        chunksSortMode: "manual",
      }),
      // The preview host: its shim bundle first, so Office, Excel and CustomFunctions exist
      // before the unmodified functions and pane bundles load.
      new HtmlWebpackPlugin({
        filename: "preview.html",
        template: "./src/preview/preview.html",
        chunks: ["preview", "functions", "taskpane"],
        chunksSortMode: "manual",
      }),
      new CopyWebpackPlugin({
        patterns: [
          { from: "src/preview/preview.css", to: "preview.css" },
          { from: "src/taskpane/taskpane.css", to: "taskpane.css" },
          { from: "assets/*.png", to: "assets/[name][ext]" },
          { from: "manifest.xml", to: "manifest.xml" },
        ],
      }),
    ],
    devServer: {
      // manifest.xml hard-codes port 3000; change both together.
      port: Number(process.env.PORT || 3000),
      server: devServerTransport(),
      // Excel on the web fetches functions.json cross-origin from its own domain.
      headers: { "Access-Control-Allow-Origin": "*" },
      static: false,
    },
  };
};
