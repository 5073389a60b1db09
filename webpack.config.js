/**
 * Builds the Excel add-in pages and the browser preview into dist/:
 *   taskpane.html  the task pane; also the shared-runtime page (loads functions.js too)
 *   functions.html a page that loads only the functions bundle (shared-runtime variant)
 *   functions.js   worksheet functions registered with CustomFunctions (src/functions/excel.ts)
 *   functions.json custom-function metadata (copied from src/functions/metadata.json)
 *   index.html     the preview workbook (grid + formula engine + task pane), no Excel needed
 *   (Office.js)    the Excel pages load it from Microsoft's CDN (OFFICE_JS_CDN); only with
 *                  OFFICE_JS=local, for closed networks, is a copy from @microsoft/office-js
 *                  served from dist/office/ instead
 *   assets/, help/ icons and the worksheet-function help page
 *   manifest.xml   only with ADDIN_ORIGIN set: the manifest rewritten for that origin
 *                  (functions.json's help URLs likewise; see scripts/deployOrigin.js)
 * HyperFormula (GPL-3.0) is only in the preview bundle, never in the Excel bundles.
 */
'use strict';
const fs = require('fs');
const path = require('path');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const TerserPlugin = require('terser-webpack-plugin');
const { helpPage } = require('./scripts/markdownPage');
const { checkOrigin, withOrigin } = require('./scripts/deployOrigin');

const root = __dirname;
const DEV_PORT = 3000;
const FUNCTIONS_ENTRY = path.join(root, 'src/functions/excel.ts');
const METADATA = path.join(root, 'src/functions/metadata.json');
const FUNCTIONS_DOC = path.join(root, 'docs/functions.md');
const OFFICE_JS = path.join(root, 'node_modules/@microsoft/office-js/dist');

/** Content-Security-Policy of the preview page: only our own scripts, no eval, nothing remote. */
const PREVIEW_CSP = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self'",
  "img-src 'self' data: blob:",
  "connect-src 'self'",
  "font-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
].join('; ');

/**
 * Office.js as Microsoft publishes it for add-ins: the Excel pages load it from here (Microsoft
 * requires the CDN copy for AppSource and keeps it current; the npm copy is a frozen snapshot).
 * Source: Microsoft, "Referencing the Office JavaScript API library"
 * (https://learn.microsoft.com/office/dev/add-ins/develop/referencing-the-javascript-api-for-office-library-from-its-cdn).
 */
const OFFICE_JS_CDN = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';

/** True for a build with OFFICE_JS=local: Office.js served from our own origin (closed networks; development only). */
function localOfficeJs() {
  const mode = process.env.OFFICE_JS;
  if (mode === undefined || mode === '' || mode === 'cdn') return false;
  if (mode === 'local') return true;
  throw new Error(`OFFICE_JS must be "cdn" (the default) or "local", not ${JSON.stringify(mode)}.`);
}

/**
 * Content-Security-Policy of the Excel pages (task pane, functions page): scripts from our own
 * origin and from Office.js's origin (nothing else, no inline script, no eval); no plugins, no
 * <base>, no form posts. Office.js loads its host files from its own origin and talks to Excel
 * through the host's message channel, so the other fetch directives are left to it.
 */
function excelCsp(local) {
  const scripts = local ? "'self'" : `'self' ${new URL(OFFICE_JS_CDN).origin}`;
  return [`script-src ${scripts}`, "object-src 'none'", "base-uri 'none'", "form-action 'none'"].join('; ');
}

/** Files the build writes that manifest.xml points at (checked by test/manifest.test.ts). */
const OUTPUTS = ['taskpane.html', 'functions.html', 'functions.js', 'functions.json', 'help/functions.html', 'index.html'];

/** Writes help/functions.html from docs/functions.md (or a short note until that doc exists). */
class HelpPagePlugin {
  apply(compiler) {
    compiler.hooks.thisCompilation.tap('HelpPagePlugin', (compilation) => {
      compilation.hooks.processAssets.tap({ name: 'HelpPagePlugin', stage: compiler.webpack.Compilation.PROCESS_ASSETS_STAGE_ADDITIONAL }, () => {
        const { RawSource } = compiler.webpack.sources;
        const markdown = fs.existsSync(FUNCTIONS_DOC)
          ? fs.readFileSync(FUNCTIONS_DOC, 'utf8')
          : '# Proton Ledger worksheet functions\n\nThe function reference is not written yet.';
        if (fs.existsSync(FUNCTIONS_DOC)) compilation.fileDependencies.add(FUNCTIONS_DOC);
        compilation.emitAsset('help/functions.html', new RawSource(helpPage('Proton Ledger — worksheet functions', markdown)));
        compilation.emitAsset('help/help.css', new RawSource(fs.readFileSync(path.join(root, 'src/taskpane/help.css'), 'utf8')));
      });
    });
  }
}

/**
 * The https server of `npm run dev-server`: the localhost certificate of office-addin-dev-certs
 * (its CA is what `npx office-addin-dev-certs install` puts in the system's trust store, which
 * Excel desktop trusts). Where that cannot be set up (no trust store, no administrator rights),
 * webpack-dev-server's own self-signed certificate, which only a browser told to accept it
 * trusts (Excel on the web), with a warning that says so.
 */
async function devServerHttps() {
  try {
    const { getHttpsServerOptions } = require('office-addin-dev-certs');
    return { type: 'https', options: await getHttpsServerOptions() };
  } catch (error) {
    console.warn(
      `[dev-server] office-addin-dev-certs could not provide a trusted certificate (${error instanceof Error ? error.message.split('\n')[0] : error}).\n` +
        '[dev-server] Serving a self-signed certificate instead: Excel desktop will not load the add-in. Run `npx office-addin-dev-certs install` (see docs/excel.md).',
    );
    return 'https';
  }
}

function buildConfig(env, argv) {
  const production = argv.mode !== 'development';
  const hasFunctions = fs.existsSync(FUNCTIONS_ENTRY);
  const entry = {
    taskpane: './src/taskpane/taskpane.ts',
    preview: './src/preview/preview.ts',
  };
  if (hasFunctions) entry.functions = './src/functions/excel.ts';
  else console.warn('[webpack] src/functions/excel.ts not found: building without the functions bundle');
  const sharedChunks = hasFunctions ? ['functions', 'taskpane'] : ['taskpane'];

  const copies = [
    { from: 'assets/*.png', to: 'assets/[name][ext]' },
    // exceljs's prebuilt browser bundle, loaded by the preview only when a download is asked for.
    { from: 'node_modules/exceljs/dist/exceljs.min.js', to: 'vendor/exceljs.min.js', info: { minimized: true } },
    { from: 'src/taskpane/pane.css', to: 'pane.css' },
    { from: 'src/preview/preview.css', to: 'preview.css' },
  ];
  const local = localOfficeJs();
  if (local) {
    copies.push(
      { from: path.join(OFFICE_JS, '*.js').replace(/\\/g, '/'), to: 'office/[name][ext]', globOptions: { ignore: ['**/*.debug.js'] } },
      // Office.js loads its host- and locale-specific files from folders beside itself.
      { from: path.join(OFFICE_JS, 'en-us').replace(/\\/g, '/'), to: 'office/en-us', noErrorOnMissing: true },
    );
  }
  const excelPage = { officeJs: local ? 'office/office.js' : OFFICE_JS_CDN, csp: excelCsp(local) };
  // A deployment build (ADDIN_ORIGIN set) rewrites the development origin in what it serves.
  const origin = process.env.ADDIN_ORIGIN ? checkOrigin(process.env.ADDIN_ORIGIN) : undefined;
  const rewrite = origin ? { transform: (content) => withOrigin(content.toString(), origin) } : {};
  if (fs.existsSync(METADATA)) copies.push({ from: 'src/functions/metadata.json', to: 'functions.json', ...rewrite });
  if (origin) copies.push({ from: 'manifest.xml', to: 'manifest.xml', ...rewrite });

  return {
    mode: production ? 'production' : 'development',
    // Source maps as files: no eval() in any bundle, so the preview's CSP holds in dev too.
    devtool: 'source-map',
    context: root,
    entry,
    // DIST_DIR builds elsewhere (the conformance test's deployment build); dist/ by default.
    output: { path: process.env.DIST_DIR ? path.resolve(root, process.env.DIST_DIR) : path.join(root, 'dist'), filename: '[name].js', clean: true },
    resolve: { extensions: ['.ts', '.js', '.json'] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: { loader: 'ts-loader', options: { transpileOnly: true, configFile: 'tsconfig.json', compilerOptions: { module: 'es2020' } } },
        },
      ],
    },
    performance: { hints: false },
    // The Excel bundles are minified; the preview bundle (HyperFormula) and the copied
    // Office.js (OFFICE_JS=local) and exceljs files are not: minifying those took about four minutes here, and
    // they are served from our own origin, where their size does not matter.
    optimization: {
      minimize: production,
      minimizer: [new TerserPlugin({ exclude: [/^office\//, /^vendor\//, /^preview/], terserOptions: { compress: { passes: 2 } } })],
    },
    plugins: [
      new HtmlWebpackPlugin({ filename: 'taskpane.html', template: './src/taskpane/taskpane.html', chunks: sharedChunks, inject: 'body', templateParameters: excelPage }),
      new HtmlWebpackPlugin({
        filename: 'functions.html',
        template: './src/taskpane/functions.html',
        chunks: hasFunctions ? ['functions'] : [],
        inject: 'body',
        templateParameters: excelPage,
      }),
      new HtmlWebpackPlugin({ filename: 'index.html', template: './src/preview/index.html', chunks: ['preview'], inject: 'body', templateParameters: { csp: PREVIEW_CSP } }),
      new CopyWebpackPlugin({ patterns: copies }),
      new HelpPagePlugin(),
    ],
    devServer: {
      port: DEV_PORT,
      // `webpack serve` replaces this with office-addin-dev-certs' certificate (devServerHttps).
      server: 'https',
      headers: { 'Access-Control-Allow-Origin': '*' },
      static: false,
      hot: false,
      liveReload: true,
      client: { overlay: false },
    },
  };
}

/** The configuration; under `webpack serve` a promise of it, with the trusted dev certificate (a build never touches the trust store). */
module.exports = (env, argv) => {
  const config = buildConfig(env, argv);
  if (!(env && env.WEBPACK_SERVE)) return config;
  return devServerHttps().then((server) => ({ ...config, devServer: { ...config.devServer, server } }));
};
module.exports.OUTPUTS = OUTPUTS;
module.exports.PREVIEW_CSP = PREVIEW_CSP;
module.exports.OFFICE_JS_CDN = OFFICE_JS_CDN;
module.exports.excelCsp = excelCsp;
module.exports.DEV_PORT = DEV_PORT;
