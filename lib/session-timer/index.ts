export { channelTimerState, SESSION_PHASES, type ChannelTimerState, type SessionPhase } from "./cycle-position";
export { sessionTimerStates, sharesOneCycle } from "./channels";
export {
  createSessionClock,
  elapsedMs,
  sessionClockReducer,
  wholeMinutesDone,
  type ClockAction,
  type ClockStatus,
  type SessionClock,
} from "./session-clock";
export { minutesAndSeconds, secondsToShow } from "./display";
