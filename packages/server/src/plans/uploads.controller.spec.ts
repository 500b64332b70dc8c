import { contentDisposition } from './uploads.controller';

describe('contentDisposition', () => {
  it('names the download in ASCII and, for the rest, in UTF-8 as RFC 6266 §4.3 and RFC 5987 §3.2 give', () => {
    expect(contentDisposition('finger-indexer.ino')).toBe(
      `attachment; filename="finger-indexer.ino"; filename*=UTF-8''finger-indexer.ino`,
    );
    expect(contentDisposition('Fräse "neu".pdf')).toBe(
      `attachment; filename="Fr_se _neu_.pdf"; filename*=UTF-8''Fr%C3%A4se%20%22neu%22.pdf`,
    );
  });
});
