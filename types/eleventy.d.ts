// Minimal typings for the programmatic Eleventy API used by lib/cli/write-site.ts.
declare module '@11ty/eleventy' {
  export default class Eleventy {
    constructor(input: string, output: string, options?: { quietMode?: boolean; configPath?: string; config?: (eleventyConfig: never) => void });
    write(): Promise<unknown>;
  }
}
