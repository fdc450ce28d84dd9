'use client';

/** The first stop on every page: jumps past the header to the page's main content. */
export function SkipLink() {
  // Pages name their main element #main-content; any page that does not still has a <main>.
  const skip = (event: React.MouseEvent<HTMLAnchorElement>) => {
    const target = document.getElementById('main-content') ?? document.querySelector('main');
    if (!target) return;
    event.preventDefault();
    if (!target.hasAttribute('tabindex')) target.setAttribute('tabindex', '-1');
    target.focus();
    target.scrollIntoView();
  };
  return (
    <a
      href="#main-content"
      onClick={skip}
      data-testid="skip-link"
      className="sr-only z-50 rounded-lg bg-white px-4 py-3 font-semibold text-bark shadow-lg focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
    >
      Skip to content
    </a>
  );
}
