// The time-studies feature: what other features mount.
export { TimeStudyPanel, type TimeStudyPanelProps } from './components/time-study-panel';
