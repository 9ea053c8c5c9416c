/**
 * A short, readable name for the browser and system in a User-Agent header ("Firefox on Linux"), for the list of
 * signed-in sessions. Unknown agents fall back to a trimmed copy of the header; an empty one to "Unknown browser".
 */
export function describeUserAgent(userAgent: string): string {
  const ua = userAgent.trim()
  if (!ua) return 'Unknown browser'
  const browser = BROWSERS.find(([pattern]) => pattern.test(ua))?.[1]
  const system = SYSTEMS.find(([pattern]) => pattern.test(ua))?.[1]
  if (!browser && !system) return ua.length > 60 ? `${ua.slice(0, 57)}…` : ua
  return `${browser ?? 'Unknown browser'}${system ? ` on ${system}` : ''}`
}

// Order matters: Edge and Opera also say "Chrome", Chrome also says "Safari", and Android also says "Linux".
const BROWSERS: Array<[RegExp, string]> = [
  [/HeadlessChrome\//, 'Headless Chrome'],
  [/Edg(e|A|iOS)?\//, 'Edge'],
  [/OPR\/|Opera/, 'Opera'],
  [/Firefox\/|FxiOS\//, 'Firefox'],
  [/Chromium\//, 'Chromium'],
  [/Chrome\/|CriOS\//, 'Chrome'],
  [/Version\/[\d.]+.*Safari\//, 'Safari'],
  [/^curl\//, 'curl'],
  [/^node|undici/i, 'Node.js'],
]
const SYSTEMS: Array<[RegExp, string]> = [
  [/Android/, 'Android'],
  [/iPhone|iPad|iPod/, 'iOS'],
  [/Windows/, 'Windows'],
  [/Mac OS X|Macintosh/, 'macOS'],
  [/CrOS/, 'ChromeOS'],
  [/Linux/, 'Linux'],
]
