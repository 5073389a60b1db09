/**
 * `npm run dev-server` serves https://localhost:3000 with office-addin-dev-certs' localhost
 * certificate (the one whose CA `npx office-addin-dev-certs install` makes trusted); a build
 * never asks for it, and where it cannot be had the server says so and falls back.
 */
const getHttpsServerOptions = jest.fn();
jest.mock('office-addin-dev-certs', () => ({ getHttpsServerOptions }));

const webpackConfig = require('../webpack.config.js') as (env: unknown, argv: { mode: string }) => unknown;

interface Config {
  devServer: { port: number; server: unknown };
}

describe('dev-server certificate', () => {
  beforeEach(() => getHttpsServerOptions.mockReset());

  test('webpack serve uses the certificate, key and CA of office-addin-dev-certs on port 3000', async () => {
    getHttpsServerOptions.mockResolvedValue({ cert: 'CERT', key: 'KEY', ca: 'CA' });
    const config = (await webpackConfig({ WEBPACK_SERVE: true }, { mode: 'development' })) as Config;
    expect(config.devServer.port).toBe(3000);
    expect(config.devServer.server).toEqual({ type: 'https', options: { cert: 'CERT', key: 'KEY', ca: 'CA' } });
  });

  test('a build does not ask for a certificate (it would touch the trust store)', () => {
    const config = webpackConfig({}, { mode: 'production' }) as Config;
    expect(getHttpsServerOptions).not.toHaveBeenCalled();
    expect(config.devServer.server).toBe('https');
  });

  test('without a trusted certificate it warns how to get one and serves a self-signed one', async () => {
    getHttpsServerOptions.mockRejectedValue(new Error('Unable to install the CA certificate.'));
    const warn = jest.spyOn(console, 'warn').mockImplementation(() => undefined);
    const config = (await webpackConfig({ WEBPACK_SERVE: true }, { mode: 'development' })) as Config;
    expect(config.devServer.server).toBe('https');
    expect(warn.mock.calls.join(' ')).toMatch(/npx office-addin-dev-certs install/);
    warn.mockRestore();
  });
});
