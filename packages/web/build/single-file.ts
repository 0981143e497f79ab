/**
 * A Vite plugin that puts the built script and style into the HTML page, so
 * the build is one file that works opened from disk (a module script loaded
 * from file:// is refused by browsers; an inline one is not).
 */
import type { Plugin } from 'vite';

/** `</script` inside a script would end it early; `<\/script` means the same to JavaScript. */
function safeScript(code: string): string {
  return code.replace(/<\/(script)/gi, '<\\/$1');
}

/**
 * Inlines every chunk and stylesheet into the HTML files of the bundle and
 * drops them from the output.
 * @example plugins: [singleFile()]
 */
export function singleFile(): Plugin {
  return {
    name: 'girth-single-file',
    enforce: 'post',
    generateBundle(_options, bundle) {
      const htmlNames = Object.keys(bundle).filter((n) => n.endsWith('.html'));
      for (const htmlName of htmlNames) {
        const html = bundle[htmlName];
        if (html === undefined || html.type !== 'asset') continue;
        let text = String(html.source);
        for (const [name, item] of Object.entries(bundle)) {
          const escaped = name.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
          if (item.type === 'chunk') {
            const tag = new RegExp(`<script type="module"[^>]*src="[^"]*${escaped}"[^>]*></script>`);
            if (!tag.test(text)) continue;
            text = text.replace(tag, () => `<script type="module">${safeScript(item.code)}</script>`);
            delete bundle[name];
          } else if (name.endsWith('.css')) {
            const tag = new RegExp(`<link rel="stylesheet"[^>]*href="[^"]*${escaped}"[^>]*>`);
            if (!tag.test(text)) continue;
            text = text.replace(tag, () => `<style>${String(item.source)}</style>`);
            delete bundle[name];
          }
        }
        html.source = text;
      }
    },
  };
}
