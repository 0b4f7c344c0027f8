import PlotArea from '@/components/PlotArea';

export default function HomePage() {
  return (
    <main className="app-shell">
      <header className="app-header">
        <h1>Throwline</h1>
        <p className="tagline">
          Hang, aim and check stage and studio lighting on a plan of the stage, with real beam photometry.
        </p>
      </header>
      <section className="plot-area" aria-label="Stage plan">
        <PlotArea />
      </section>
    </main>
  );
}
