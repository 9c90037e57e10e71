// Webpack build for the Plumbline add-in.
//
// Exported as a function so callers (webpack-cli `--env outputPath=...`, or the
// build test) can redirect output without clobbering dist/.
const fs = require('node:fs');
const os = require('node:os');
const path = require('node:path');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const CustomFunctionsMetadataPlugin = require('custom-functions-metadata-plugin');
const webpack = require('webpack');
// The build helpers are TypeScript (tested in test/scripts/build/); tsx compiles them on load.
const { require: requireTs } = require('tsx/cjs/api');
const { deployTarget } = requireTs('./scripts/build/deployTarget.ts', __filename);
const { manifestForTarget } = requireTs('./scripts/build/manifestForTarget.ts', __filename);
const { allowErrorsAsInput } = requireTs('./scripts/build/functionsMetadata.ts', __filename);
const { version: packageVersion } = require('./package.json');

const FUNCTIONS_SOURCE = path.resolve(__dirname, 'src/functions/functions.ts');
const FUNCTIONS_METADATA = 'functions.json';

// After CustomFunctionsMetadataPlugin has generated functions.json from the JSDoc, let every
// parameter receive error values (scripts/build/functionsMetadata.ts says why and where).
class AllowErrorsAsInputPlugin {
  apply(compiler) {
    compiler.hooks.thisCompilation.tap('AllowErrorsAsInputPlugin', (compilation) => {
      compilation.hooks.processAssets.tap({ name: 'AllowErrorsAsInputPlugin', stage: webpack.Compilation.PROCESS_ASSETS_STAGE_ADDITIONS }, () => {
        const generated = compilation.getAsset(FUNCTIONS_METADATA);
        // Without the asset the generator has already reported why.
        if (!generated) return;
        try {
          const json = allowErrorsAsInput(generated.source.source().toString());
          compilation.updateAsset(FUNCTIONS_METADATA, new webpack.sources.RawSource(json));
        } catch (error) {
          compilation.errors.push(new webpack.WebpackError(`${FUNCTIONS_METADATA}: ${error.message}`));
        }
      });
    });
  }
}

// Office only loads add-ins over https. office-addin-dev-certs writes trusted
// localhost certificates here (`npx office-addin-dev-certs install`); without
// them we fall back to http so the server still starts for plain browser work.
function devServerTransport() {
  const dir = path.join(os.homedir(), '.office-addin-dev-certs');
  const files = { key: 'localhost.key', cert: 'localhost.crt', ca: 'ca.crt' };
  const present = Object.values(files).every((f) => fs.existsSync(path.join(dir, f)));
  if (!present) return 'http';
  const options = {};
  for (const [k, f] of Object.entries(files)) options[k] = fs.readFileSync(path.join(dir, f));
  return { type: 'https', options };
}

module.exports = (env = {}, argv = {}) => {
  const mode = argv.mode || 'production';
  const outputPath = env.outputPath ? path.resolve(env.outputPath) : path.resolve(__dirname, 'dist');
  // Where dist/ will be served from: PLUMB_ORIGIN (default https://localhost:3000) and the manifest
  // version, PLUMB_VERSION or package.json's. `--env origin=... --env version=...` do the same.
  const target = deployTarget({
    origin: env.origin ?? process.env.PLUMB_ORIGIN,
    version: env.version ?? process.env.PLUMB_VERSION,
    packageVersion,
  });

  return {
    mode,
    context: __dirname,
    devtool: mode === 'development' ? 'source-map' : false,
    entry: {
      taskpane: './src/taskpane/index.tsx',
      functions: './src/functions/functions.ts',
      preview: './src/preview/index.tsx',
    },
    output: {
      path: outputPath,
      // No content hashes: manifest.xml refers to functions.js by a fixed name.
      filename: '[name].js',
      clean: true,
    },
    // One runtime and one copy of the engine for every page: in the shared runtime the cell
    // functions and the pane then use the very same fit cache, so they can never disagree.
    optimization: {
      runtimeChunk: 'single',
      splitChunks: {
        cacheGroups: {
          // @stdlib's gammaincinv pulls in `debug` (and its `ms`): they belong with the engine,
          // not once in each of functions.js and taskpane.js.
          engine: { test: /[\\/]src[\\/]engine[\\/]|[\\/]node_modules[\\/](@stdlib|debug|ms)[\\/]/, name: 'engine', chunks: 'all', enforce: true },
        },
      },
    },
    resolve: {
      extensions: ['.ts', '.tsx', '.js'],
    },
    module: {
      rules: [
        {
          test: /\.tsx?$/,
          exclude: /node_modules/,
          use: {
            loader: 'ts-loader',
            // Type checking is `tsc --noEmit -p .` in `npm test`; the bundle only transpiles.
            options: { transpileOnly: true, compilerOptions: { noEmit: false } },
          },
        },
      ],
    },
    plugins: [
      new CustomFunctionsMetadataPlugin({ input: FUNCTIONS_SOURCE, output: FUNCTIONS_METADATA }),
      new AllowErrorsAsInputPlugin(),
      // Shared runtime: Excel loads this single page for the pane AND the cell
      // functions, so it must carry both bundles, functions first so the
      // cell functions are registered before any pane code runs.
      new HtmlWebpackPlugin({
        filename: 'taskpane.html',
        template: './src/taskpane/taskpane.html',
        chunks: ['functions', 'taskpane'],
        chunksSortMode: 'manual',
      }),
      // The preview host: its shim bundle first, so Office, Excel and CustomFunctions exist
      // before the unmodified functions and pane bundles load.
      new HtmlWebpackPlugin({
        filename: 'preview.html',
        template: './src/preview/preview.html',
        chunks: ['preview', 'functions', 'taskpane'],
        chunksSortMode: 'manual',
      }),
      new CopyWebpackPlugin({
        patterns: [
          { from: 'src/preview/preview.css', to: 'preview.css' },
          { from: 'src/taskpane/taskpane.css', to: 'taskpane.css' },
          { from: 'assets/*.png', to: 'assets/[name][ext]' },
          // The repository's manifest is written for https://localhost:3000; dist/ gets it for the target.
          { from: 'manifest.xml', to: 'manifest.xml', transform: (content) => manifestForTarget(content.toString('utf8'), target) },
        ],
      }),
    ],
    devServer: {
      // manifest.xml hard-codes port 3000; change both together.
      port: Number(process.env.PORT || 3000),
      server: devServerTransport(),
      // Excel on the web fetches functions.json cross-origin from its own domain.
      headers: { 'Access-Control-Allow-Origin': '*' },
      static: false,
    },
  };
};
