import { Body, Equator, Horizon, HourAngle, Observer, SearchHourAngle, SearchRiseSet } from "astronomy-engine";
import { describe, expect, it } from "vitest";
import {
  daylightHours,
  dayOfYear,
  equationOfTime_min,
  hourAngle_deg,
  noonZenith,
  solarDeclination,
  solarZenithAngle,
} from "../../lib/atmosphere";
import { InputError } from "../../lib/errors";
import { expectClose } from "../helpers/close";

// Outside reference: the general-purpose astronomy library astronomy-engine
// (dev dependency, used only in tests): apparent topocentric Sun, no refraction.
function referenceZenith(latitude: number, longitude: number, utc: Date): number {
  const observer = new Observer(latitude, longitude, 0);
  const eq = Equator(Body.Sun, utc, observer, true, true);
  return 90 - Horizon(utc, observer, eq.ra, eq.dec).altitude;
}

/** UTC instant of a local mean solar time at a longitude. */
function utcOf(date: string, localSolarTime_h: number, longitude: number): Date {
  const t = Date.parse(`${date}T00:00:00Z`) + (localSolarTime_h - longitude / 15) * 3600e3;
  return new Date(t);
}

const CASES: ReadonlyArray<[number, number, string, number]> = [
  // latitude °N, longitude °E, date, local mean solar time h
  [0, 0, "2026-03-20", 12],
  [45, 0, "2026-06-21", 9.5],
  [45, 0, "2026-12-21", 15],
  [-33.9, 18.4, "2026-01-15", 11],
  [52.2, 0.1, "2026-09-23", 7.25],
  [69.6, 19, "2026-05-10", 13.5],
  [-77.8, 166.7, "2026-11-03", 12],
  [19.8, -155.5, "2026-08-01", 17],
  [35, 139.7, "2026-02-11", 10],
];

describe("solarZenithAngle", () => {
  for (const [lat, lon, date, lst] of CASES) {
    it(`agrees with astronomy-engine within 0.05° (0.5° without the longitude) at ${lat}°, ${date}, ${lst} h local mean solar time`, () => {
      const doy = dayOfYear(date);
      const z = solarZenithAngle({ latitude_deg: lat, dayOfYear: doy, localSolarTime_h: lst, longitude_deg: lon });
      expectClose(z, referenceZenith(lat, lon, utcOf(date, lst, lon)), { abs: 0.05 });
      // without the longitude the Sun's declination is taken at the wrong UT hour: still within 0.5°
      const z0 = solarZenithAngle({ latitude_deg: lat, dayOfYear: doy, localSolarTime_h: lst });
      expectClose(z0, referenceZenith(lat, lon, utcOf(date, lst, lon)), { abs: 0.5 });
    });
  }

  it("treats apparent solar time as already corrected by the equation of time", () => {
    const doy = dayOfYear("2026-11-03");
    const mean = solarZenithAngle({ latitude_deg: 40, dayOfYear: doy, localSolarTime_h: 12 });
    const apparent = solarZenithAngle({
      latitude_deg: 40,
      dayOfYear: doy,
      localSolarTime_h: 12 + equationOfTime_min(doy) / 60,
      apparentTime: true,
    });
    expectClose(apparent, mean, { abs: 0.02 });
  });

  it("uses the year: the same day of year one leap cycle apart differs by under 0.2° in declination", () => {
    const d2024 = solarDeclination(80, 12, 2024);
    const d2026 = solarDeclination(80, 12, 2026);
    expect(Math.abs(d2024 - d2026)).toBeGreaterThan(0.05);
    expect(Math.abs(d2024 - d2026)).toBeLessThan(0.5);
    const utc = new Date("2024-03-20T12:00:00Z");
    expectClose(d2024, Equator(Body.Sun, utc, new Observer(0, 0, 0), true, true).dec, { abs: 0.02 }, "2024");
  });

  it("throws if the latitude, day or time is out of range", () => {
    expect(() => solarZenithAngle({ latitude_deg: 91, dayOfYear: 10, localSolarTime_h: 12 })).toThrow(InputError);
    expect(() => solarZenithAngle({ latitude_deg: 0, dayOfYear: 0, localSolarTime_h: 12 })).toThrow(/day of year/);
    expect(() => solarZenithAngle({ latitude_deg: 0, dayOfYear: 366, localSolarTime_h: 12, year: 2026 })).toThrow(
      /1–365 for 2026/,
    );
    expect(() => solarZenithAngle({ latitude_deg: 0, dayOfYear: 10, localSolarTime_h: 25 })).toThrow(
      /local solar time/,
    );
  });
});

describe("solarDeclination and equationOfTime_min", () => {
  for (const date of [
    "2026-01-04",
    "2026-03-20",
    "2026-05-15",
    "2026-06-21",
    "2026-08-30",
    "2026-11-03",
    "2026-12-21",
  ]) {
    it(`agree with astronomy-engine on ${date} (declination within 0.02°, equation of time within 0.2 min)`, () => {
      const utc = new Date(`${date}T12:00:00Z`);
      const observer = new Observer(0, 0, 0);
      const eq = Equator(Body.Sun, utc, observer, true, true);
      const doy = dayOfYear(date);
      expectClose(solarDeclination(doy, 12), eq.dec, { abs: 0.02 }, "declination");
      // hour angle of the true Sun at 12:00 mean solar time on the Greenwich meridian = equation of time
      let ha_h = HourAngle(Body.Sun, utc, observer);
      if (ha_h > 12) ha_h -= 24;
      expectClose(equationOfTime_min(doy, 12), ha_h * 60, { abs: 0.2 }, "equation of time");
      expectClose(hourAngle_deg(doy, 12), ha_h * 15, { abs: 0.05 }, "hour angle");
    });
  }
});

describe("noonZenith", () => {
  for (const [lat, date] of [
    [45, "2026-06-21"],
    [-30, "2026-06-21"],
    [60, "2026-12-21"],
    [10, "2026-04-01"],
  ] as const) {
    it(`agrees with astronomy-engine's zenith at the Sun's meridian transit for ${lat}° on ${date} (within 0.5°)`, () => {
      const observer = new Observer(lat, 0, 0);
      const transit = SearchHourAngle(Body.Sun, observer, 0, new Date(`${date}T00:00:00Z`));
      expectClose(noonZenith({ latitude_deg: lat, dayOfYear: dayOfYear(date) }), 90 - transit.hor.altitude, {
        abs: 0.5,
      });
    });
  }
});

describe("daylightHours", () => {
  for (const [lat, date] of [
    [0, "2026-03-20"],
    [45, "2026-06-21"],
    [45, "2026-12-21"],
    [60, "2026-09-01"],
    [-40, "2026-01-10"],
  ] as const) {
    it(`agrees with astronomy-engine's sunrise-to-sunset time for ${lat}° on ${date} (within 10 min)`, () => {
      const observer = new Observer(lat, 0, 0);
      const start = new Date(`${date}T00:00:00Z`);
      const rise = SearchRiseSet(Body.Sun, observer, +1, start, 1);
      const set = rise ? SearchRiseSet(Body.Sun, observer, -1, rise.date, 1) : null;
      expect(rise && set).toBeTruthy();
      const hours = (set!.date.getTime() - rise!.date.getTime()) / 3600e3;
      expectClose(daylightHours({ latitude_deg: lat, dayOfYear: dayOfYear(date) }), hours, { abs: 10 / 60 });
    });
  }

  it("gives 24 h in polar day and 0 h in polar night", () => {
    expect(daylightHours({ latitude_deg: 80, dayOfYear: dayOfYear("2026-06-21") })).toBe(24);
    expect(daylightHours({ latitude_deg: 80, dayOfYear: dayOfYear("2026-12-21") })).toBe(0);
    expect(daylightHours({ latitude_deg: -90, dayOfYear: dayOfYear("2026-12-21") })).toBe(24);
  });

  it("gives 12 h at the equator for the geometric sunrise zenith of 90°", () => {
    expectClose(daylightHours({ latitude_deg: 0, dayOfYear: 80, sunriseZenith_deg: 90 }), 12, { abs: 1e-9 });
  });

  it("throws if the sunrise zenith is out of range", () => {
    expect(() => daylightHours({ latitude_deg: 0, dayOfYear: 80, sunriseZenith_deg: 190 })).toThrow(InputError);
  });
});

describe("dayOfYear", () => {
  it("counts days from 1 January, with 29 February in leap years", () => {
    expect(dayOfYear("2026-01-01")).toBe(1);
    expect(dayOfYear("2026-03-20")).toBe(79);
    expect(dayOfYear("2024-03-20")).toBe(80);
    expect(dayOfYear("2024-12-31")).toBe(366);
    expect(dayOfYear("2000-02-29")).toBe(60);
  });

  it("throws for a malformed or impossible date", () => {
    expect(() => dayOfYear("2026-3-20")).toThrow(InputError);
    expect(() => dayOfYear("2026-02-29")).toThrow(/not a calendar date/);
    expect(() => dayOfYear("1900-02-29")).toThrow(/not a calendar date/);
    expect(() => dayOfYear("2026-13-01")).toThrow(InputError);
  });
});
