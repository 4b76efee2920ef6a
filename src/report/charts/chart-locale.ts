// The number and time formats charts print with: a plain hyphen-minus for negative numbers
// (d3-format's default is U+2212, which the axis then measures and draws differently from the
// rest of the package), and fixed English names, so no machine setting leaks into the bytes.
export const CHART_LOCALE = {
  number: { decimal: '.', thousands: ',', grouping: [3], currency: ['$', ''], minus: '-' },
  time: {
    dateTime: '%Y-%m-%d %H:%M:%S',
    date: '%Y-%m-%d',
    time: '%H:%M:%S',
    periods: ['AM', 'PM'],
    days: ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'],
    shortDays: ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'],
    months: ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'],
    shortMonths: ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'],
  },
} as const;
