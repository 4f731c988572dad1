// Eleventy configuration: TypeScript page templates (loaded through tsx, which the CLI registers) in content/.
export default function (eleventyConfig) {
  eleventyConfig.addExtension(['11ty.ts'], { key: '11ty.js' });
  eleventyConfig.addTemplateFormats('11ty.ts');
  eleventyConfig.addPassthroughCopy({ 'content/assets': 'assets' });
  eleventyConfig.setQuietMode(true);
  return {
    dir: { input: 'content', includes: '_includes', data: '_data' },
    templateFormats: ['11ty.ts'],
  };
}
