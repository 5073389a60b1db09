/**
 * The origin an add-in deployment is served from. manifest.xml and the functions' help
 * URLs are written for the development server (https://localhost:3000); a build with
 * ADDIN_ORIGIN set (`ADDIN_ORIGIN=https://addins.example.org npm run build`) writes
 * dist/manifest.xml and dist/functions.json with that origin instead, so the files a
 * deployment serves never point at a developer's machine.
 */
'use strict';

const DEV_ORIGIN = 'https://localhost:3000';

/**
 * Checks a deployment origin: https, a host, no path, query or credentials (Office loads
 * add-in pages over https only). Returns it without a trailing slash; throws with the reason.
 */
function checkOrigin(text) {
  let url;
  try {
    url = new URL(String(text).trim());
  } catch {
    throw new Error(`ADDIN_ORIGIN "${text}" is not a URL; give an origin such as https://addins.example.org`);
  }
  if (url.protocol !== 'https:') throw new Error(`ADDIN_ORIGIN "${text}" must use https: Office loads add-in pages over https only`);
  if (url.username || url.password || url.search || url.hash || (url.pathname !== '/' && url.pathname !== '')) {
    throw new Error(`ADDIN_ORIGIN "${text}" must be an origin only (scheme, host and port), with no path, query or credentials`);
  }
  return url.origin;
}

/** Replaces every development-origin URL in a text with the deployment origin. */
function withOrigin(text, origin) {
  return text.split(DEV_ORIGIN).join(origin);
}

module.exports = { DEV_ORIGIN, checkOrigin, withOrigin };
