export function App() {
  return (
    <main>
      <h1>Plumbline</h1>
      <p>The guided regression pane is coming soon.</p>
    </main>
  );
}
