import { Injectable } from '@nestjs/common';
import { gunzipSync } from 'node:zlib';
import { PublishedGuideCache } from './published-guide-cache';
import { PublishedGuidesService } from './published-guides.service';
import { guideIndexShell, guidePageShell, staticPageShell, type GuideShellSource, type PageShell, type ShellPage } from './public-page-shell';

/**
 * The shells of the public guide pages, made from the same cached answers the API serves: for a published guide,
 * one Redis read for its tag and one for the shell made under that tag; the first reader of a new state pays for
 * unzipping the cached answer once. Null when the guide is not published, so an unknown or withdrawn guide's page
 * is the plain studio page and says nothing of it.
 */
@Injectable()
export class PublicPageShellService {
  constructor(
    private readonly published: PublishedGuidesService,
    private readonly cache: PublishedGuideCache,
  ) {}

  async shellFor(page: ShellPage): Promise<PageShell | null> {
    if (page.kind === 'static') return staticPageShell(page.name);
    if (page.kind === 'index') {
      const tag = await this.published.indexTag();
      return (await this.cache.page(tag, async () => guideIndexShell(await this.published.index()))) as PageShell;
    }
    const { workshopSlug, guideSlug } = page;
    const tag = await this.published.readTag(workshopSlug, guideSlug);
    if (tag === null) return null;
    return (await this.cache.page(tag, async () => {
      const answer = await this.published.readAnswer(workshopSlug, guideSlug, tag);
      const source = 'gzippedJson' in answer ? (JSON.parse(gunzipSync(answer.gzippedJson).toString('utf8')) as GuideShellSource) : answer.personal;
      return guidePageShell(source as GuideShellSource);
    })) as PageShell;
  }
}
