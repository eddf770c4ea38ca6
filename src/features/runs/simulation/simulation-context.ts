// Where the simulation hook gets its workers from. The app uses real Web Workers; a test can
// provide ports that run the same engine in-process.
import { createContext, useContext } from 'react';
import { openWorkerPort, type OpenSimulationPort } from './simulation-port';

export const SimulationPortContext = createContext<OpenSimulationPort>(openWorkerPort);

export const useOpenSimulationPort = () => useContext(SimulationPortContext);
