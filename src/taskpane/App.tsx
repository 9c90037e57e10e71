import { useMemo, useReducer } from 'preact/hooks';
import { analyzeRead } from './model/paneAnalysis';
import { paneReducer } from './state/paneReducer';
import { INITIAL_STATE } from './state/paneState';
import { usePaneCommands } from './state/usePaneCommands';
import { CompareSection } from './views/CompareSection';
import { DataSection } from './views/DataSection';
import { PredictSection } from './views/PredictSection';
import { ReportSection } from './views/ReportSection';
import { ResultsSection } from './views/ResultsSection';
import { SettingsSection } from './views/SettingsSection';
import { useOfficeTheme } from './views/useOfficeTheme';

/** The guided pane: data, settings, comparison and prediction choices, results in words, and the report. */
export function App() {
  useOfficeTheme();
  const [state, dispatch] = useReducer(paneReducer, INITIAL_STATE);
  const commands = usePaneCommands(state, dispatch);
  const { data, choices } = state;
  // The one analysis of the data read, under the current choices: the cards show it and Write report writes it.
  const analysis = useMemo(() => (data === undefined ? undefined : analyzeRead(data, choices)), [data, choices]);
  const props = { state, analysis, dispatch, commands };
  return (
    <main class="pane">
      <h1>Plumbline</h1>
      <DataSection {...props} />
      <SettingsSection {...props} />
      <CompareSection {...props} />
      <PredictSection {...props} />
      <ResultsSection {...props} />
      <ReportSection {...props} />
    </main>
  );
}
