"""Hourly year: the laundry's solar hot-water system simulated hour by hour
over an invented year (SIM_YEAR), beside the monthly f-chart estimate of the
same system.

The hourly weather is INVENTED: no measured data of any real place. It is
made here, deterministically, by the model below, for the invented town of
Orrin Bay (scenario.py):

- Sun: declination, equation of time and the Earth-orbit factor of
  Spencer (1971), the solar time from the clock time (UTC offset and
  longitude), the zenith angle at the middle of each hour. The sun is taken
  as down below an elevation of SUN_CUTOFF_DEG (2°): those hours get no
  irradiance, which leaves margin against the exact sun position the Calc
  functions use (NREL SPA, up to about 0.5° away from this simple geometry).
- Global horizontal irradiance: GHI = kT·G_on·cos z, kT the hourly
  clearness index = (day's cloudiness c) × (clear-sky clearness at the sun's
  elevation α: KT_MAX·(1 − exp(−sin α/0.12)), modest at low sun) × (an hourly
  flicker on partly cloudy days), kept within 0.02..KT_MAX (0.78), so the beam
  normal irradiance stays well below G_on. The day's cloudiness comes from a
  seeded pseudo-random sequence (Python's random.Random(SEED), an AR(1)
  sequence from day to day through a logistic function); one offset per
  month is found by bisection so that the month's mean daily GHI equals
  scenario.H_HORIZONTAL_MJ.
- Diffuse horizontal irradiance: DHI = GHI × the hourly diffuse fraction of
  Erbs, Klein & Duffie (1982) at that kT (the correlation SUN_DIFFUSE_FRACTION
  evaluates).
- Ambient temperature: the monthly means of scenario.T_AMBIENT_MEAN
  interpolated between mid-months, plus a day-to-day AR(1) anomaly, plus a
  daily swing (larger on clear days) peaking at 15:00 solar time; each month
  is shifted to hit its scenario mean.
- Values rounded to 0.1 (W/m², °C) to keep the file small; DHI <= GHI kept.

The sheet then computes the irradiance on the collector plane (SUN_TILTED),
the incidence angle (SUN_INCIDENCE), the hot-water draw and the cold-water
temperature hour by hour, and SIM_YEAR simulates the year from those columns.
Each of those four computed columns is one array formula over its 8760 rows
(the file stores the formula once, not 8760 times: 11 MB instead of 15 MB).
The data sheet prints two days only (1 January and 21 June), the report is
printed landscape with page breaks that keep tables and charts whole.
"""
import datetime
import math
import random

import scenario as sc
from workbook import (BOLD, CAUTIONS, HEADING_COLOUR, RESULT_COLOUR, ROW_HEIGHT, Column, Sheet, cell_range,
                      column_letter)

FILE = "hourly-year.fods"

YEAR = 2025                 # invented, non-leap
SEED = 46089                # invented seed of the pseudo-random cloudiness
KT_MAX = 0.78               # highest hourly clearness index of the invented sky
SUN_CUTOFF_DEG = 2.0        # sun elevation below which the invented sky gives no irradiance
HOURS = 8760
PRINTED_HOURS = 48          # the data sheet prints its first two days only
FIRST_SERIAL = (datetime.date(YEAR, 1, 1) - datetime.date(1899, 12, 30)).days  # Calc date serial of 1 January

# Monthly (τα)‾/(τα)_n: the hours' incidence angle modifier weighted by their irradiance on the plane.
RATIO_FORMULA = ("SUMPRODUCT((MONTH({dt})={fm})*{g_t}*COLL_IAM({theta};{b0}))/"
                 "SUMPRODUCT((MONTH({dt})={fm})*{g_t})")
REPORT = "Report"
DATA = "Hourly data"


# -- the invented hourly year ---------------------------------------------------
def _sun(day, clock_hour):
    """(cos zenith, extraterrestrial normal irradiance G_on in W/m², solar time in h) on day 1..365 at a
    local standard clock time, from Spencer's (1971) series."""
    b = 2 * math.pi * (day - 1) / 365
    declination = (0.006918 - 0.399912 * math.cos(b) + 0.070257 * math.sin(b) - 0.006758 * math.cos(2 * b)
                   + 0.000907 * math.sin(2 * b) - 0.002697 * math.cos(3 * b) + 0.00148 * math.sin(3 * b))
    equation_of_time = 229.18 * (0.000075 + 0.001868 * math.cos(b) - 0.032077 * math.sin(b)
                                 - 0.014615 * math.cos(2 * b) - 0.04089 * math.sin(2 * b))  # min
    solar_time = clock_hour + (4 * (sc.LONGITUDE - 15 * sc.UTC_OFFSET) + equation_of_time) / 60
    hour_angle = math.radians(15 * (solar_time - 12))
    latitude = math.radians(sc.LATITUDE)
    cos_zenith = (math.sin(latitude) * math.sin(declination)
                  + math.cos(latitude) * math.cos(declination) * math.cos(hour_angle))
    g_on = 1361 * (1.000110 + 0.034221 * math.cos(b) + 0.001280 * math.sin(b) + 0.000719 * math.cos(2 * b)
                   + 0.000077 * math.sin(2 * b))
    return cos_zenith, g_on, solar_time


def _erbs(kt):
    """Hourly diffuse fraction of Erbs, Klein & Duffie (1982)."""
    if kt <= 0.22:
        return 1 - 0.09 * kt
    if kt <= 0.80:
        return 0.9511 - 0.1604 * kt + 4.388 * kt ** 2 - 16.638 * kt ** 3 + 12.336 * kt ** 4
    return 0.165


def _logistic(x):
    return 1 / (1 + math.exp(-x))


def _month_of_day():
    months = []
    for month, days in enumerate(sc.DAYS_IN_MONTH):
        months += [month] * days
    return months


def _ambient_means():
    """Daily mean temperature from the monthly means, interpolated between mid-months (periodic)."""
    mid, day = [], 0
    for days in sc.DAYS_IN_MONTH:
        mid.append(day + days / 2)
        day += days
    out = []
    for d in range(365):
        x = d + 0.5
        for k in range(12):
            left, right = mid[k - 1] - (365 if k == 0 else 0), mid[k]
            if left <= x < right:
                w = (x - left) / (right - left)
                out.append(sc.T_AMBIENT_MEAN[k - 1] * (1 - w) + sc.T_AMBIENT_MEAN[k] * w)
                break
        else:
            w = (x - mid[11]) / (mid[0] + 365 - mid[11])
            out.append(sc.T_AMBIENT_MEAN[11] * (1 - w) + sc.T_AMBIENT_MEAN[0] * w)
    return out


def invented_hourly_year():
    """8760 rows (Calc date-time serial at mid-hour, GHI W/m², DHI W/m², ambient °C), 1 January 00:30 first.
    INVENTED weather; see the module docstring for the model."""
    rng = random.Random(SEED)
    month_of_day = _month_of_day()
    # Random numbers first, so that the bisection below reuses the same sky.
    cloud_state, x = [], 0.0
    for _ in range(365):
        x = 0.55 * x + math.sqrt(1 - 0.55 ** 2) * rng.gauss(0, 1)
        cloud_state.append(x)
    flicker = [[rng.gauss(0, 1) for _ in range(24)] for _ in range(365)]
    anomaly, a = [], 0.0
    for _ in range(365):
        a = 0.75 * a + math.sqrt(1 - 0.75 ** 2) * rng.gauss(0, 2.2)
        anomaly.append(a)

    sun = [[_sun(d + 1, h + 0.5) for h in range(24)] for d in range(365)]

    def clear_kt(cos_zenith):
        return KT_MAX * (1 - math.exp(-cos_zenith / 0.12))

    def day_kt(d, offset):
        cloudiness = 0.12 + 0.88 * _logistic(1.6 * cloud_state[d] + offset)
        out = []
        for h in range(24):
            cos_zenith = sun[d][h][0]
            if cos_zenith < math.sin(math.radians(SUN_CUTOFF_DEG)):
                out.append(0.0)
                continue
            kt = cloudiness * clear_kt(cos_zenith) * (1 + 0.6 * cloudiness * (1 - cloudiness) * flicker[d][h])
            out.append(min(KT_MAX, max(0.02, kt)))
        return out

    def month_mean_mj(month, offset):
        days = [d for d in range(365) if month_of_day[d] == month]
        total = 0.0
        for d in days:
            for h, kt in enumerate(day_kt(d, offset)):
                total += kt * sun[d][h][1] * max(0.0, sun[d][h][0])
        return total * 3600 / 1e6 / len(days)

    offsets = []
    for month in range(12):
        low, high = -8.0, 8.0
        for _ in range(60):
            middle = (low + high) / 2
            if month_mean_mj(month, middle) < sc.H_HORIZONTAL_MJ[month]:
                low = middle
            else:
                high = middle
        offsets.append((low + high) / 2)

    daily_mean = _ambient_means()
    rows, temperature = [], []
    for d in range(365):
        kts = day_kt(d, offsets[month_of_day[d]])
        cloudiness = 0.12 + 0.88 * _logistic(1.6 * cloud_state[d] + offsets[month_of_day[d]])
        swing = 2.0 + 4.5 * (cloudiness - 0.12) / 0.88  # half the day's range, K: larger on clear days
        for h in range(24):
            cos_zenith, g_on, solar_time = sun[d][h]
            ghi = kts[h] * g_on * max(0.0, cos_zenith)
            dhi = _erbs(kts[h]) * ghi
            temperature.append(daily_mean[d] + anomaly[d] + swing * math.cos(2 * math.pi * (solar_time - 15) / 24))
            ghi_r = round(ghi, 1)
            rows.append([FIRST_SERIAL + (24 * d + h + 0.5) / 24, ghi_r, min(round(dhi, 1), ghi_r)])
    # Shift each month onto its scenario mean temperature.
    hour = 0
    for month, days in enumerate(sc.DAYS_IN_MONTH):
        block = range(hour, hour + 24 * days)
        shift = sc.T_AMBIENT_MEAN[month] - sum(temperature[i] for i in block) / len(block)
        for i in block:
            rows[i].append(round(temperature[i] + shift, 1))
        hour += 24 * days
    return [tuple(r) for r in rows]


# -- layout helpers --------------------------------------------------------------
def page_style(document, name, landscape):
    styles = document.StyleFamilies.getByName("PageStyles")
    if not styles.hasByName(name):
        styles.insertByName(name, document.createInstance("com.sun.star.style.PageStyle"))
    style = styles.getByName(name)
    style.IsLandscape = landscape
    style.Width, style.Height = (29700, 21000) if landscape else (21000, 29700)  # A4, 1/100 mm
    style.TopMargin = style.BottomMargin = 1200
    style.LeftMargin = style.RightMargin = 1500
    style.HeaderIsOn = False
    style.FooterIsOn = False
    return name


def on_report(report, key):
    return "$%s.%s" % (REPORT, report.ref(key))


# -- the workbook --------------------------------------------------------------------
def build(document):
    sheets = document.Sheets
    report_sheet = sheets.getByIndex(0)
    report_sheet.Name = REPORT
    report_sheet.PageStyle = page_style(document, "Hourly year report", landscape=True)
    sheets.insertNewByName(DATA, 1)
    data_sheet = sheets.getByName(DATA)
    data_sheet.PageStyle = page_style(document, "Hourly year data", landscape=False)

    r = Sheet(document, report_sheet, widths=(7600, 2300, 2100, 2300, 2300, 2300, 2300, 2300, 2300))
    r.title("Hourly year – %s (invented)" % sc.CLIENT, sc.SCENARIO + " This workbook simulates the proposed "
            "system hour by hour over an invented year of weather (sheet \"%s\") with SIM_YEAR and sets the "
            "monthly f-chart estimate of the same system beside it." % DATA)

    # 1 Site and plane ---------------------------------------------------------------
    mark = r.row
    r.heading("1  Site and collector plane")
    r.input("latitude", "Latitude", sc.LATITUDE, "°", "north positive; invented site")
    r.input("longitude", "Longitude", sc.LONGITUDE, "°", "east positive; invented site")
    r.input("utc_offset", "Offset of the local clock from UTC", sc.UTC_OFFSET, "h", "winter time all year")
    r.input("tilt", "Collector tilt", sc.TILT, "°", "from horizontal")
    r.input("azimuth", "Collector azimuth", sc.AZIMUTH, "°", "clockwise from north; 190 = 10° west of south")
    r.input("albedo", "Ground reflectance", sc.ALBEDO, "–", "grass and gravel (common practice)")
    r.input("sky_model", "Sky model for the tilted plane", "hdkr", "text", "\"isotropic\", \"hdkr\" or \"perez\"")
    r.note("Method: the hourly irradiance on the collector plane is SUN_TILTED (beam, sky diffuse by the chosen sky "
           "model, ground-reflected) and the angle of incidence SUN_INCIDENCE, both with the NREL SPA sun position, "
           "on the sheet \"%s\"." % DATA)
    r.keep(mark)
    r.space()

    # 2 Collector field ---------------------------------------------------------------
    mark = r.row
    r.heading("2  Collector field (invented glazed flat plate, EN ISO 9806 coefficients on the gross area)")
    r.input("module_area", "Gross area of one module", sc.MODULE_AREA, "m²", "invented")
    r.input("modules", "Number of modules", sc.MODULES, "–", "the proposed field", number_format="0")
    r.result("coll_area", "Collector area", "{module_area}*{modules}", "m²", "SIM_YEAR's collector range: this "
             "cell and the 5 below")
    r.input("eta0", "Peak efficiency η0", sc.ETA0, "–", "invented test result", number_format="0.000")
    r.input("a1", "Heat loss coefficient a1", sc.A1, "W/(m²·K)", "invented test result")
    r.input("a2", "Heat loss coefficient a2", sc.A2, "W/(m²·K²)", "invented test result", number_format="0.000")
    r.input("b0", "Incidence angle modifier b0", sc.B0, "–", "invented test result")
    r.input("flow", "Collector-loop flow per m²", sc.FLOW_PER_M2, "kg/(s·m²)", "low-flow design value (common "
            "practice)", number_format="0.000")
    r.keep(mark)
    r.space()

    # 3 Store ---------------------------------------------------------------------------
    mark = r.row
    r.heading("3  Hot-water store")
    r.input("ins_thickness", "Insulation thickness", sc.TANK_INSULATION, "m", "invented")
    r.input("ins_k", "Insulation conductivity", sc.TANK_INSULATION_K, "W/(m·K)", "mineral wool or PU foam "
            "(common practice)", number_format="0.000")
    r.input("tank_volume", "Store volume", sc.TANK_VOLUME, "m³", "SIM_YEAR's tank range: this cell and the 5 "
            "below")
    r.input("tank_height", "Height of the water", sc.TANK_HEIGHT, "m", "invented")
    r.result("tank_ua", "Heat loss coefficient UA", "STORE_TANK_UA(SQRT(4*{tank_volume}/(PI()*{tank_height}));"
             "{tank_height};{ins_thickness};{ins_k})", "W/K", "STORE_TANK_UA, outer film 10 W/(m²·K) (its default)")
    r.input("nodes", "Fully mixed nodes of the store model", 10, "–", "invented; 1 = one fully mixed store",
            number_format="0")
    r.input("t_set", "Delivery set-point", sc.T_SET, "°C", "the in-line heater tops up to it")
    r.input("t_room", "Temperature around the store", sc.T_PLANT_ROOM, "°C", "plant room, invented")
    r.result("tank_diameter", "Inside diameter of the store", "SQRT(4*{tank_volume}/(PI()*{tank_height}))", "m",
             "from volume and height")
    r.keep(mark)
    r.space()

    # 4 Controls --------------------------------------------------------------------------
    mark = r.row
    r.heading("4  Pump controls (the SIM_YEAR defaults, written out)")
    r.input("dt_on", "Pump on: collector above store bottom", 7, "K", "standing (no-flow) collector temperature; "
            "invented")
    r.input("dt_off", "Pump off: outlet above store bottom", 2, "K", "collector outlet with flow; invented")
    r.input("t_max", "Maximum store temperature", 95, "°C", "the pump stops at it; invented, below boiling")
    r.keep(mark)
    r.space()

    # 5 Hot-water use -----------------------------------------------------------------------
    mark = r.row
    r.heading("5  Hot-water use of the laundry (invented)")
    r.input("daily_litres", "Daily draw at the set-point", sc.DAILY_DRAW_LITRES, "l/day", "every day of the year "
            "alike", number_format="0")
    r.result("rho_set", "Density of water at the set-point", "WATER_DENSITY({t_set})", "kg/m³", "WATER_DENSITY",
             number_format="0.0")
    r.result("daily_kg", "Daily draw as mass", "{daily_litres}*{rho_set}/1000", "kg/day", "the litres are measured "
             "at the set-point", number_format="0.0")
    top = r.row + 1
    r.labels("mains_month", "Month", sc.MONTHS, 0, top)
    r.row = top - 1
    r.table([Column("t_mains", "Cold water", "°C", values=sc.T_MAINS, number_format="0.0")], 12, first_column=1)
    r.labels("profile_hour", "Hour", ["%02d–%02d h" % (h, h + 1) for h in range(24)], 3, top)
    r.row = top - 1
    r.table([Column("profile", "Share of the day", "–", values=sc.HOURLY_DRAW_SHARE, number_format="0.00")], 24,
            first_column=4)
    note_row = top + 13
    r.sheet.getCellByPosition(0, note_row).setString("The cold-water temperature of a month applies to each of "
                                                     "its hours.")
    r.sheet.getCellByPosition(0, note_row + 1).setString("Each hour draws its share of the daily draw, the same "
                                                         "every day.")
    r.sheet.getCellRangeByPosition(0, note_row, 0, note_row + 1).CharPosture = 2  # italic
    r.sheet.getCellByPosition(5, top).setString("Sum of the shares (must be 1):")
    r.cells["profile_sum"] = r._absolute(8, top)
    sum_cell = r.sheet.getCellByPosition(8, top)
    sum_cell.setFormula("=" + r.expand("SUM({profile})"))
    sum_cell.NumberFormat = r.number_format("0.000")
    sum_cell.CellBackColor = RESULT_COLOUR
    sum_cell.CharWeight = BOLD
    r.row = top + 24
    r.keep(mark)
    r.space()

    # The hourly data sheet ------------------------------------------------------------------
    d = build_data_sheet(document, data_sheet, r)

    def data_range(first_key, last_key=None):
        last_key = last_key or first_key
        first_column, first, last = d.columns[first_key]
        last_column = d.columns[last_key][0]
        return "$'%s'.$%s$%d:$%s$%d" % (DATA, column_letter(first_column), first + 1, column_letter(last_column),
                                        last + 1)

    for key in ("dt", "ghi", "dhi", "t_amb", "g_t", "theta", "draw", "t_cold"):
        r.cells[key] = data_range(key)
    r.cells["weather"] = data_range("t_amb", "theta")
    r.cells["load"] = data_range("draw", "t_cold")
    sim_arguments = "{weather};{load};{coll_area}:{flow};{tank_volume}:{t_room};{dt_on}:{t_max}"

    # 6 The invented year, month by month ---------------------------------------------------
    mark = r.row
    r.heading("6  The invented hourly year, month by month (summed from the sheet \"%s\")" % DATA)
    r.note("The weather is invented by a deterministic model (described on the sheet \"%s\") whose monthly means "
           "are tuned to the scenario's monthly climate (yellow); the green columns are summed over the 8760 hours "
           "with SUMPRODUCT." % DATA)
    top = r.row + 1
    r.labels("m_label", "Month", sc.MONTHS, 0, top)
    r.labels("m", "No.", list(range(1, 13)), 1, top)
    r.row = top - 1
    in_month = "(MONTH({dt})={m})"
    r.table([
        Column("days", "Days", "d", formula="SUMPRODUCT(%s*1)/24" % in_month, number_format="0"),
        Column("h_target", "GHI, scenario", "MJ/(m²·d)", values=sc.H_HORIZONTAL_MJ, number_format="0.0"),
        Column("h_hourly", "GHI, hourly", "MJ/(m²·d)", formula="SUMPRODUCT(%s*{ghi})*3600/1E6/{days}" % in_month,
               number_format="0.00"),
        Column("h_t", "On the plane", "MJ/(m²·d)", formula="SUMPRODUCT(%s*{g_t})*3600/1E6/{days}" % in_month,
               number_format="0.00"),
        Column("ta_target", "Ambient, scenario", "°C", values=sc.T_AMBIENT_MEAN, number_format="0.0"),
        Column("ta_hourly", "Ambient, hourly", "°C", formula="SUMPRODUCT(%s*{t_amb})/(24*{days})" % in_month,
               number_format="0.00"),
        Column("tc", "Cold water", "°C", formula="SUMPRODUCT(%s*{t_cold})/(24*{days})" % in_month,
               number_format="0.0"),
    ], 12, first_column=2)
    r.result("hours", "Hours in the data", "SUM({days})*24", "h", "8760 expected (non-leap year)", number_format="0")
    r.result("h_year", "Irradiation on the plane over the year", "SUMPRODUCT({h_t};{days})", "MJ/m²",
             number_format="0")
    r.keep(mark)
    mark = r.row
    r.chart("climate_chart", "Invented year: mean daily irradiation", "m_label", ["h_target", "h_hourly", "h_t"],
            "Month", "MJ/(m²·day)", kind="column", height_rows=15, last_column=5)
    r.keep(mark)
    r.space()

    # 7 SIM_YEAR ---------------------------------------------------------------------------
    mark = r.row
    r.heading("7  Hourly simulation of the year (SIM_YEAR)")
    r.note("Method: SIM_YEAR, one array formula over the 13 × 8 block below: EN ISO 9806 collector curve with the "
           "incidence angle modifier, pumped loop with a differential controller, a store of fully mixed nodes, "
           "tempering valve and in-line auxiliary heater, hour by hour with sub-steps. Inputs: the weather columns "
           "(ambient, plane irradiance, incidence) and load columns (draw, cold water) of \"%s\", the collector "
           "(section 2), store (section 3) and controls (section 4) ranges. Not modelled: pipe losses, heat "
           "exchanger, heat capacity of the collector, freezing, boiling." % DATA)
    header_row = r.row
    first = header_row + 1
    sim_columns = [("sim_month", "Month no.", "", "0"), ("sim_coll", "Collector", "kWh", "0"),
                   ("sim_demand", "Demand", "kWh", "0"), ("sim_aux", "Auxiliary", "kWh", "0"),
                   ("sim_loss", "Store loss", "kWh", "0"), ("sim_f", "Solar fraction", "–", "0.0%"),
                   ("sim_pump", "Pump running", "h", "0"), ("sim_tmax", "Max. store top", "°C", "0.0")]
    r.labels("sim_label", "Month", sc.MONTHS, 0, first)
    year_cell = r.sheet.getCellByPosition(0, first + 12)
    year_cell.setString("Year")
    year_cell.CellBackColor = HEADING_COLOUR
    year_cell.CharWeight = BOLD
    for offset, (key, header, unit, code) in enumerate(sim_columns):
        column = 1 + offset
        r.columns[key] = (column, first, first + 11)
        r.cells["year_" + key[4:]] = r._absolute(column, first + 12)
        r.header(column, header_row, header, unit)
        r.sheet.getCellRangeByPosition(column, first, column, first + 12).NumberFormat = r.number_format(code)
    r.sheet.Rows.getByIndex(header_row).Height = 2 * ROW_HEIGHT
    block = r.sheet.getCellRangeByPosition(1, first, 8, first + 12)
    block.setArrayFormula("=" + r.expand('SIM_YEAR(%s;"monthly")' % sim_arguments))
    block.CellBackColor = RESULT_COLOUR
    r.sheet.getCellRangeByPosition(1, first + 12, 8, first + 12).CharWeight = BOLD
    r.row = first + 13
    r.keep(mark)
    mark = r.row
    r.result("annual_collector_kwh", "Collector yield over the year", "{year_coll}", "kWh", "heat delivered to the "
             "store", number_format="0", named=True)
    r.result("specific_yield", "Collector yield per m²", "{annual_collector_kwh}/{coll_area}", "kWh/m²",
             number_format="0")
    r.result("annual_demand_kwh", "Hot-water demand over the year", "{year_demand}", "kWh", "the draws lifted from "
             "cold water to the set-point", number_format="0", named=True)
    r.result("annual_auxiliary_kwh", "Auxiliary heat over the year", "{year_aux}", "kWh", "in-line heater",
             number_format="0", named=True)
    r.result("annual_solar_fraction_hourly", "Solar fraction over the year (SIM_YEAR)", "{year_f}", "–",
             "1 − auxiliary/demand", number_format="0.0%", named=True)
    r.result("annual_pump_hours", "Pump running time", "{year_pump}", "h", number_format="0")
    r.result("max_tank_temperature", "Highest store-top temperature", "{year_tmax}", "°C",
             "scalding: see the notes", number_format="0.0", named=True)
    r.result("limit_reached", "Store reached its maximum?", 'IF({max_tank_temperature}>={t_max}-0.05;"yes";"no")',
             "", "the maximum of section 4: the pump stops there")
    r.keep(mark)
    mark = r.row
    r.chart("energy_chart", "SIM_YEAR: monthly energies", "sim_label", ["sim_coll", "sim_demand", "sim_aux"],
            "Month", "kWh", kind="column", height_rows=16, last_column=5)
    r.keep(mark)
    r.space()

    # 8 f-chart -----------------------------------------------------------------------------
    mark = r.row
    r.heading("8  The same system by the f-chart method (monthly)")
    r.note("Method: FCHART_X, FCHART_Y and FCHART_F (liquid system) with FCHART_STORAGE_CORR and FCHART_DHW_CORR, "
           "fed with the monthly means of the same invented hourly year: irradiation on the plane, ambient and "
           "cold-water temperatures, and the load Σ m·cp·(T_set − T_cold) over the hourly draws with cp of WATER_CP "
           "(taken, as in SIM_YEAR, at the mean of the set-point and the mean cold-water temperature).")
    r.note("F_R quantities: the EN ISO 9806 curve refers to the mean fluid temperature; Duffie & Beckman §6.19 "
           "convert it to the inlet basis of the f-chart with F_R(τα)_n = η0·r and F_R·U_L = U_L,m·r, "
           "r = 1/(1 + A·U_L,m/(2·ṁ·cp)) (conversion as recalled from memory); the quadratic a2 term is folded "
           "into U_L,m = a1 + a2·ΔT at a representative temperature difference. Direct loop, no heat exchanger "
           "(as in SIM_YEAR), so F_R′ = F_R.")
    r.input("dt_rep", "Representative T_mean − T_ambient", 40, "K", "invented, for linearising the a2 term")
    r.result("cp_water", "Specific heat of the water", "WATER_CP(({t_set}+AVERAGE({t_cold}))/2)", "J/(kg·K)",
             "WATER_CP at the mean of set-point and cold water", number_format="0.0")
    r.result("ul_mean", "Linear loss coefficient U_L,m", "{a1}+{a2}*{dt_rep}", "W/(m²·K)", "mean-fluid basis",
             number_format="0.000")
    r.result("loop_rate", "Collector-loop capacity rate ṁ·cp", "{flow}*{coll_area}*{cp_water}", "W/K",
             number_format="0")
    r.result("fr_factor", "Conversion factor r to the inlet basis", "1/(1+{coll_area}*{ul_mean}/(2*{loop_rate}))",
             "–", "Duffie & Beckman §6.19", number_format="0.0000")
    r.result("fr_ta", "F_R′(τα)_n", "{eta0}*{fr_factor}", "–", number_format="0.0000")
    r.result("fr_ul", "F_R′·U_L", "{ul_mean}*{fr_factor}", "W/(m²·K)", number_format="0.000")
    r.result("storage_per_m2", "Store per m² of collector", "{tank_volume}*1000/{coll_area}", "l/m²",
             "f-chart standard: 75 l/m²", number_format="0.0")
    r.result("storage_corr", "Storage correction of X", "FCHART_STORAGE_CORR({storage_per_m2})", "–",
             "valid 37.5..300 l/m²", number_format="0.000")
    r.keep(mark)
    mark = r.row
    r.note("(τα)‾/(τα)_n of each month: the incidence angle modifier COLL_IAM at each hour's incidence angle, "
           "weighted by the hour's irradiance on the plane – the same modifier SIM_YEAR applies to the whole "
           "irradiance. FCHART_DHW_CORR holds for cold water 5..20 °C and a set-point of 50..70 °C; every month "
           "here lies inside.")
    top = r.row + 1
    r.labels("fc_label", "Month", sc.MONTHS, 0, top)
    r.labels("fm", "No.", list(range(1, 13)), 1, top)
    r.row = top - 1
    fm = "(MONTH({dt})={fm})"
    r.table([
        Column("fc_load", "Load", "kWh", formula="{cp_water}*SUMPRODUCT(%s*{draw}*({t_set}-{t_cold}))/3.6E6" % fm,
               number_format="0"),
        Column("fc_ratio", "(τα)‾/(τα)n", "–", formula=RATIO_FORMULA, number_format="0.000"),
        Column("fc_dhw", "DHW corr.", "–", formula="FCHART_DHW_CORR(INDEX({tc};{fm});{t_set};INDEX({ta_hourly};{fm}))",
               number_format="0.000"),
        Column("fc_x", "X corrected", "–", formula="FCHART_X({coll_area};{fr_ul};INDEX({ta_hourly};{fm});"
               "INDEX({days};{fm});{fc_load}*3.6E6)*{storage_corr}*{fc_dhw}", number_format="0.00"),
        Column("fc_y", "Y", "–", formula="FCHART_Y({coll_area};{fr_ta};{fc_ratio};INDEX({h_t};{fm})*1E6;"
               "INDEX({days};{fm});{fc_load}*3.6E6)", number_format="0.00"),
        Column("fc_f", "f, f-chart", "–", formula="FCHART_F({fc_x};{fc_y})", number_format="0.0%"),
        Column("fc_sim", "f, SIM_YEAR", "–", formula="INDEX({sim_f};{fm})", number_format="0.0%"),
    ], 12, first_column=2)
    # COLL_IAM over a range iterates only inside an array formula (in SUMPRODUCT alone Calc passes it one
    # cell, by implicit intersection): each ratio cell is a 1x1 array formula.
    column, first_fc, last_fc = r.columns["fc_ratio"]
    for row in range(first_fc, last_fc + 1):
        r.sheet.getCellRangeByPosition(column, row, column, row).setArrayFormula("=" + r.expand(RATIO_FORMULA, row))
    r.result("fchart_load_kwh", "Load over the year (f-chart)", "SUM({fc_load})", "kWh", "vs SIM_YEAR's demand "
             "(section 7)", number_format="0")
    r.result("load_ratio", "f-chart load / SIM_YEAR demand", "{fchart_load_kwh}/{annual_demand_kwh}", "–",
             "same draws, same cp: 1 expected", number_format="0.00000")
    r.result("annual_solar_fraction_fchart", "Solar fraction over the year (f-chart)",
             "SUMPRODUCT({fc_f};{fc_load})/{fchart_load_kwh}", "–", "monthly f weighted by the monthly load",
             number_format="0.0%", named=True)
    r.result("fraction_hourly_again", "Solar fraction over the year (SIM_YEAR)", "{annual_solar_fraction_hourly}",
             "–", "section 7", number_format="0.0%")
    r.result("fraction_gap", "SIM_YEAR minus f-chart", "{annual_solar_fraction_hourly}-"
             "{annual_solar_fraction_fchart}", "–", "in fraction points", number_format="0.0%")
    r.keep(mark)
    mark = r.row
    r.chart("fraction_chart", "Monthly solar fraction: SIM_YEAR and f-chart", "fc_label", ["fc_sim", "fc_f"],
            "Month", "solar fraction", kind="column", height_rows=14, last_column=5)
    r.note("Why they differ: f-chart is a correlation fitted to simulations of standard systems (a standard store "
           "size, a heat exchanger in the collector loop, fixed controls) and works from monthly means; it does not "
           "see this laundry's daytime draw profile, the stratification of the store, the day-to-day sequence of "
           "sunny and cloudy days or the tempering valve. SIM_YEAR here has no pipe losses, no heat exchanger and "
           "no collector heat capacity, which all favour it. They are two models of one invented system; neither "
           "is a measurement.")
    r.keep(mark)
    r.space()

    # 9 Safety notes -------------------------------------------------------------------------
    mark = r.row
    r.heading("9  What the year says about safety")
    r.note("Method: MIN, COUNTIF and MAX over the hourly columns; COLL_STAGNATION_TEMP; the hourly output of "
           "SIM_YEAR (its collector column) counted where the plane receives strong sun.")
    r.result("t_amb_min", "Lowest ambient temperature", "MIN({t_amb})", "°C", "of the invented year",
             number_format="0.0")
    r.result("frost_hours", "Hours below 0 °C", 'COUNTIF({t_amb};"<0")', "h", number_format="0")
    r.result("g_t_max", "Highest irradiance on the plane", "MAX({g_t})", "W/m²", number_format="0")
    r.result("t_stagnation", "Stagnation temperature (peak sun, hottest air)",
             "COLL_STAGNATION_TEMP({eta0};{a1};{a2};MAX({t_amb});{g_t_max})", "°C", "COLL_STAGNATION_TEMP; an "
             "upper estimate from the curve", number_format="0")
    r.input("g_strong", "Irradiance counted as strong sun", 300, "W/m²", "invented threshold")
    r.result("stagnation_hours", "Strong-sun hours without collector flow",
             'SUMPRODUCT(({g_t}>={g_strong})*(INDEX(SIM_YEAR(%s;"hourly");0;3)<=0))' % sim_arguments, "h",
             "the collector stagnates in these hours", number_format="0")
    r.result("hours_at_max", "Hours ending with the store top at its maximum",
             'SUMPRODUCT((INDEX(SIM_YEAR(%s;"hourly");0;1)>={t_max}-0.05)*1)' % sim_arguments, "h",
             "the pump is held off by the maximum of section 4", number_format="0")
    r.keep(mark)
    mark = r.row
    r.notes(CAUTIONS + [
        "Scalding in this system: SIM_YEAR lets the store top reach the temperature shown in section 7 (the pump "
        "stops at the maximum of section 4). Water above about 50 °C scalds; fit a thermostatic mixing valve "
        "after the store and the in-line heater, as local codes require.",
        "Stagnation: when the store reaches its maximum, or the pump or the power fails, the collectors stand in "
        "the sun at up to the stagnation temperature shown above; the hours counted above are those of this "
        "invented year only; the collector also stands, short of the maximum, whenever the store is too warm for "
        "the sun of the hour. The laundry's closing days (holidays), when nothing is drawn, are not in this "
        "model and make stagnation more frequent: plan for it (heat rejection, drain-back, or a fluid and "
        "components rated for it).",
        "Freeze protection: SIM_YEAR does not model freezing. The invented year has the frost hours counted above; "
        "a collector loop filled with water, as simulated here, would freeze. Use antifreeze with a heat exchanger "
        "(then correct the collector with HX_COLLECTOR_PENALTY, which lowers the yield) or a drain-back system.",
        "Legionella: in winter the store stays lukewarm (see the monthly maximum store-top temperatures); the "
        "in-line heater heats the water drawn, not the store. Where local rules require a regular heat-up of "
        "the whole store, that auxiliary heat is not in these figures.",
    ])
    r.keep(mark)

    report_sheet.setPrintAreas((cell_range(report_sheet, 0, 0, len(r.widths) - 1, r.row - 1),))
    r.paginate()
    # Calc gives a formula cell the format it infers (here 0.00 % for a difference of percentages) when it first
    # calculates it, over the format set before: set it again after a calculation.
    document.calculateAll()
    report_sheet.getCellRangeByName(r.ref("fraction_gap")).NumberFormat = r.number_format("0.0%")


def build_data_sheet(document, sheet, r):
    """The sheet of 8760 hours: invented weather (yellow) and the hourly formulas (green)."""
    d = Sheet(document, sheet, widths=(3800, 2100, 2100, 2100, 2300, 2300, 2300, 2300))
    d.title("Hourly data – invented year %d for %s" % (YEAR, sc.TOWN), "INVENTED hourly weather, not measured "
            "data of any place: made by a deterministic model in hourly_year.py (seeded pseudo-random cloudiness "
            "on a clear-sky clearness index over a simple sun geometry, Erbs diffuse fraction, monthly means tuned "
            "to the scenario; see its module text). Local winter time, values at the middle of each hour.")
    d.heading("Inputs taken from the sheet \"%s\"" % REPORT)
    for key, source, label, unit, code in (
            ("lat", "latitude", "Latitude", "°", "0.0"), ("lon", "longitude", "Longitude", "°", "0.0"),
            ("utc", "utc_offset", "UTC offset", "h", "0"), ("tilt", "tilt", "Collector tilt", "°", "0"),
            ("az", "azimuth", "Collector azimuth", "°", "0"), ("albedo", "albedo", "Ground reflectance", "–", "0.00"),
            ("model", "sky_model", "Sky model", "text", "@"), ("daily_kg", "daily_kg", "Daily draw", "kg/day", "0.0")):
        d.result(key, label, on_report(r, source), unit, "linked", number_format=code)
    d.note("The columns On the plane (SUN_TILTED), Incidence (SUN_INCIDENCE), Draw and Cold water are each one array "
           "formula over the 8760 rows. Printed: 1 January and 21 June; the sheet holds all %d hours, and SIM_YEAR "
           "and the monthly sums on \"%s\" use them all." % (HOURS, REPORT))
    d.cells["profile"] = "$%s.%s" % (REPORT, r.range("profile"))
    d.cells["mains"] = "$%s.%s" % (REPORT, r.range("t_mains"))
    rows = invented_hourly_year()
    d.table([
        Column("dt", "Local date and time", "", values=[row[0] for row in rows], number_format="YYYY-MM-DD HH:MM"),
        Column("ghi", "GHI", "W/m²", values=[row[1] for row in rows], number_format="0.0"),
        Column("dhi", "DHI", "W/m²", values=[row[2] for row in rows], number_format="0.0"),
        Column("t_amb", "Ambient", "°C", values=[row[3] for row in rows], number_format="0.0"),
    ], HOURS)
    d.array_columns([
        Column("g_t", "On the plane", "W/m²", formula="SUN_TILTED({ghi};{dhi};{lat};{lon};{utc};{dt};{tilt};{az};"
               "{albedo};{model})", number_format="0.0"),
        Column("theta", "Incidence", "°", formula="SUN_INCIDENCE({lat};{lon};{utc};{dt};{tilt};{az})",
               number_format="0.0"),
        Column("draw", "Draw", "kg/h", formula="{daily_kg}*INDEX({profile};HOUR({dt})+1)", number_format="0.0"),
        Column("t_cold", "Cold water", "°C", formula="INDEX({mains};MONTH({dt}))", number_format="0.0"),
    ], beside="dt", first_column=4)
    _, first, _ = d.columns["dt"]
    last_column = len(d.widths) - 1
    june_21 = first + 24 * (datetime.date(YEAR, 6, 21) - datetime.date(YEAR, 1, 1)).days
    sheet.setPrintAreas((cell_range(sheet, 0, 0, last_column, first + 23),
                         cell_range(sheet, 0, june_21, last_column, june_21 + 23)))
    sheet.setPrintTitleRows(True)
    sheet.setTitleRows(cell_range(sheet, 0, first - 1, last_column, first - 1))
    return d
