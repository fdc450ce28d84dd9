import { expect, type Page } from '@playwright/test';

/** The saw station as the operator uses it: taps only, no hover. */
export class SawStationPage {
  constructor(readonly page: Page) {}

  progress() {
    return this.page.getByTestId('saw-progress');
  }

  async boardsCut(): Promise<{ done: number; total: number }> {
    const text = (await this.progress().textContent()) ?? '';
    const [, done, total] = text.match(/(\d+) of (\d+)/) ?? [];
    return { done: Number(done), total: Number(total) };
  }

  /** Confirms the board on screen; answers its number and the new offcut's tag, if one was kept. */
  async confirmCurrentBoard(): Promise<{ boardNo: number; tag: string | null }> {
    const button = this.page.getByTestId('board-done');
    const boardNo = Number(((await button.textContent()) ?? '').match(/Board (\d+) done/)![1]);
    await button.tap();
    const message = this.page.getByTestId('station-message');
    // A board the stock count says is gone is asked about first; in these tests it is always there.
    const question = this.page.getByTestId('board-count-question');
    await expect(message.filter({ hasText: `Board ${boardNo} done` }).or(question)).toBeVisible();
    if (await question.isVisible())
      await question.getByRole('button', { name: 'Yes, the board is here' }).tap();
    await expect(message).toContainText(`Board ${boardNo} done`);
    const text = (await message.textContent()) ?? '';
    return { boardNo, tag: text.match(/tagged (K-\d+)/)?.[1] ?? null };
  }

  /** Cuts every board left in sequence order; answers the tags of the kept offcuts. */
  async cutEverything(): Promise<string[]> {
    const tags: string[] = [];
    for (let i = 0; i < 60; i++) {
      if (await this.page.getByTestId('plan-finished').isVisible()) break;
      const { tag } = await this.confirmCurrentBoard();
      if (tag) tags.push(tag);
    }
    await expect(this.page.getByTestId('plan-finished')).toBeVisible();
    return tags;
  }
}
