// The core's inch-fraction helpers are not in its public index yet; this is the one place that
// reaches into its sources, so that the day they are exported only this line changes.
export { formatInchFraction, parseInchFraction } from '../../../../../core/src/units/inch-fraction';
