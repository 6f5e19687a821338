"""Collector sizing: monthly irradiation on the roof plane, the laundry's hot-water load, the collector's
efficiency curve, a monthly f-chart of the proposed field, the annual solar fraction against collector area
and the stagnation temperature. Every input comes from the invented scenario (scenario.py) or is labelled
invented here.
"""
from scenario import (A1, A2, ALBEDO, AZIMUTH, B0, CLIENT, DAILY_DRAW_LITRES, DAYS_IN_MONTH, ETA0, FLOW_PER_M2,
                      H_HORIZONTAL_MJ, LATITUDE, MODULE_AREA, MODULES, MONTHS, SCENARIO, T_AMBIENT_MEAN, T_MAINS,
                      T_SET, TANK_VOLUME, TILT)
from workbook import CAUTIONS, ROW_HEIGHT, Column, Sheet, mark_point

FILE = "collector-sizing.fods"

NARROW = 2100               # 1/100 mm: table columns right of the note column
SIZE_OPTIONS = [3, 6, 9, 12, 15, 18]   # modules per option; 2.0 m³ keeps them all within 37.5..300 l/m²


def build(document):
    sheet = document.Sheets.getByIndex(0)
    sheet.Name = "Collector sizing"
    s = Sheet(document, sheet)
    s.title("Collector sizing – %s (invented)" % CLIENT, SCENARIO)

    # -- 1 -------------------------------------------------------------------------------------------------
    s.heading("1  Site and collector plane")
    s.note("The roof plane as it enters the monthly irradiation of section 2 (SUN_MONTHLY_TILTED). Azimuth is "
           "measured clockwise from north: 180° faces due south.")
    s.input("latitude", "Latitude of the site", LATITUDE, "°", "invented, north positive")
    s.input("tilt", "Collector tilt from horizontal", TILT, "°", "invented roof pitch")
    s.input("azimuth", "Azimuth the collectors face", AZIMUTH, "°", "invented: 10° west of south")
    s.input("albedo", "Ground reflectance (albedo)", ALBEDO, "–", "common practice for grass and gravel")
    s.space()

    # -- 2 -------------------------------------------------------------------------------------------------
    s.heading("2  Monthly climate and irradiation on the collector plane")
    s.note("Method: SUN_MONTHLY_TILTED turns the monthly-mean daily horizontal irradiation H into H_T on the "
           "tilted plane (diffuse share from the monthly clearness by Erbs et al., beam by Klein's Rb on the "
           "month's mean day, isotropic sky and ground). The function works in J/m² per day: H in MJ is "
           "multiplied by 1E6 going in and H_T divided by 1E6 coming out. All climate figures are invented.")
    s.table([
        Column("month", "Month", "", values=MONTHS),
        Column("month_no", "Month no.", "–", values=list(range(1, 13)), number_format="0"),
        Column("days", "Days", "d", values=DAYS_IN_MONTH, number_format="0"),
        Column("h", "H, horizontal (invented)", "MJ/(m²·day)", values=H_HORIZONTAL_MJ, number_format="0.0"),
        Column("t_amb", "Ambient, mean", "°C", values=T_AMBIENT_MEAN, number_format="0.0", width=NARROW),
        Column("t_mains", "Mains water", "°C", values=T_MAINS, number_format="0.0", width=NARROW),
        Column("ht", "H_T, tilted", "MJ/(m²·day)",
               formula="SUN_MONTHLY_TILTED({h}*1E6;{latitude};{month_no};{tilt};{azimuth};{albedo})/1E6",
               number_format="0.00", width=NARROW),
    ], 12, group="months", header_lines=3)
    s.result("annual_horizontal", "Annual irradiation, horizontal", "SUMPRODUCT({h};{days})/3.6", "kWh/m²",
             "Σ H·days; 3.6 MJ = 1 kWh", number_format="0")
    s.result("annual_tilted_irradiation", "Annual irradiation on the collector plane",
             "SUMPRODUCT({ht};{days})/3.6", "kWh/m²", "Σ H_T·days; 3.6 MJ = 1 kWh", number_format="0", named=True)
    s.chart("irradiation", "Monthly-mean daily irradiation", "month", ["h", "ht"], "Month", "MJ/(m²·day)",
            kind="column", height_rows=16)
    s.space()

    # -- 3 -------------------------------------------------------------------------------------------------
    s.page_break()
    s.heading("3  Hot-water load of the laundry")
    s.note("Method: STORE_WATER gives the heat to warm a volume of water from the mains to the set-point with "
           "the density and enthalpy of IAPWS-IF97. It takes the volume at the start (mains) temperature, while "
           "the draw is counted at the set-point, so each month's volume is scaled by ρ(set-point)/ρ(mains). "
           "Result in J: ÷1E9 gives GJ, and 1 GJ = 277.8 kWh. Losses of the store and of any circulation loop "
           "are not included.")
    s.input("draw", "Daily hot-water draw at the set-point", DAILY_DRAW_LITRES, "l/day", "invented laundry use")
    s.input("t_set", "Delivery set-point", T_SET, "°C", "invented; see the Legionella note")
    s.result("rho_set", "Density of water at the set-point", "WATER_DENSITY({t_set})", "kg/m³", "IAPWS-IF97",
             number_format="0.0")
    s.table([
        Column("month_load", "Month", "", formula="{month}"),
        Column("volume", "Cold water, month", "m³",
               formula="{draw}/1000*{days}*{rho_set}/WATER_DENSITY({t_mains})", number_format="0.00"),
        Column("load", "Load L", "GJ", formula="STORE_WATER({volume};{t_mains};{t_set})/1E9",
               number_format="0.000"),
        Column("load_kwh", "Load L", "kWh", formula="{load}*1E9/3.6E6", number_format="0"),
    ], 12, group="months", header_lines=3)
    s.result("annual_load", "Annual hot-water load", "SUM({load})", "GJ", "Σ of the months", number_format="0.00",
             named=True)
    s.result("annual_load_mwh", "Annual hot-water load", "{annual_load}/3.6", "MWh", "1 MWh = 3.6 GJ",
             number_format="0.0")
    s.space()

    # -- 4 -------------------------------------------------------------------------------------------------
    s.heading("4  Collector field from the test coefficients")
    s.note("Method: COLL_EFFICIENCY evaluates the quadratic EN ISO 9806 efficiency curve on the mean fluid "
           "temperature Tm, η = η0 − a1·(Tm − Ta)/G − a2·(Tm − Ta)²/G. The coefficients are invented, on the "
           "gross area of one module; they hold within the temperature range of the (invented) test.")
    s.input("eta0", "Peak efficiency η0", ETA0, "–", "invented test coefficient")
    s.input("a1", "Heat loss coefficient a1", A1, "W/(m²·K)", "invented test coefficient")
    s.input("a2", "Heat loss coefficient a2", A2, "W/(m²·K²)", "invented test coefficient", number_format="0.000")
    s.input("b0", "Incidence angle modifier coefficient b0", B0, "–", "invented test coefficient")
    s.input("module_area", "Gross area of one module", MODULE_AREA, "m²", "invented")
    s.input("modules", "Number of modules proposed", MODULES, "–", "invented", number_format="0")
    s.result("collector_area", "Collector area of the proposed field", "{modules}*{module_area}", "m²",
             "gross area, as the coefficients", number_format="0.00", named=True)
    s.input("t_amb_curve", "Ambient temperature for the curve", 20, "°C", "invented; only Tm − Ta matters")
    s.input("g1", "Irradiance G₁", 1000, "W/m²", "invented clear-sky value", number_format="0")
    s.input("g2", "Irradiance G₂", 500, "W/m²", "invented hazy or low-sun value", number_format="0")
    s.table([
        Column("dt", "Tm − Ta", "K", values=list(range(0, 90, 10)), number_format="0"),
        Column("tm", "Mean fluid temp. Tm", "°C", formula="{t_amb_curve}+{dt}", number_format="0"),
        Column("reduced", "(Tm − Ta)/G₁", "m²·K/W", formula="{dt}/{g1}", number_format="0.000"),
        Column("eta_g1", "η at G₁", "–", formula="COLL_EFFICIENCY({eta0};{a1};{a2};{tm};{t_amb_curve};{g1})",
               number_format="0.000"),
        Column("eta_g2", "η at G₂", "–", formula="COLL_EFFICIENCY({eta0};{a1};{a2};{tm};{t_amb_curve};{g2})",
               number_format="0.000", width=NARROW),
        Column("eta_lin", "η at G₁, a2 left out", "–",
               formula="COLL_EFFICIENCY({eta0};{a1};0;{tm};{t_amb_curve};{g1})", number_format="0.000",
               width=NARROW),
    ], 9)
    s.header_formula("eta_g1", '"η at "&TEXT({g1};"0")&" W/m²"')
    s.header_formula("eta_g2", '"η at "&TEXT({g2};"0")&" W/m²"')
    s.header_formula("eta_lin", '"η at "&TEXT({g1};"0")&" W/m², no a2"')
    s.sheet.Rows.getByIndex(s.columns["dt"][1] - 1).Height = 3 * ROW_HEIGHT
    s.chart("efficiency", "Collector efficiency curve (gross area)", "dt", ["eta_g1", "eta_g2", "eta_lin"],
            "Tm − Ta [K]", "Efficiency η [–]", height_rows=16)
    s.space()

    # -- 5 -------------------------------------------------------------------------------------------------
    s.page_break()
    s.heading("5  Monthly f-chart of the proposed field")
    s.note("Method: the f-chart for liquid systems (Klein, Beckman & Duffie): FCHART_X and FCHART_Y per month, "
           "X corrected with FCHART_STORAGE_CORR for the store size and FCHART_DHW_CORR for water heating, then "
           "FCHART_F. The f-chart needs the collector as F_R·U_L and F_R·(τα)_n on the inlet temperature, while the "
           "test curve is on the mean fluid temperature. With Tm = T_in + Q/(2·ṁ·cp), Duffie & Beckman §6.19: "
           "F_R·U_L = a1/r and F_R·(τα)_n = η0/r, r = 1 + a1/(2·(ṁ/A)·cp). The f-chart is linear in the losses: "
           "a1 serves as U_L and a2 is left out (section 4 shows what that changes). A heat exchanger between "
           "collector loop and store would lower F_R to F_R′ by the factor of HX_COLLECTOR_PENALTY.")
    s.input("flow", "Collector-loop flow per m²", FLOW_PER_M2, "kg/(s·m²)",
            "low-flow design value (common practice)",
            number_format="0.000")
    s.input("t_loop", "Loop temperature for cp", 40, "°C", "invented representative value")
    s.result("cp_loop", "Specific heat of the loop fluid (water)", "WATER_CP({t_loop})", "J/(kg·K)",
             "IAPWS-IF97; glycol: GLYCOL_CP", number_format="0")
    s.result("r_conv", "Conversion r = 1 + a1/(2·(ṁ/A)·cp)", "1+{a1}/(2*{flow}*{cp_loop})", "–",
             "mean-fluid to inlet basis, D&B §6.19", number_format="0.0000")
    s.result("fr_ul", "F_R·U_L", "{a1}/{r_conv}", "W/(m²·K)", "a1/r", number_format="0.000")
    s.result("fr_ta", "F_R·(τα)_n", "{eta0}/{r_conv}", "–", "η0/r", number_format="0.000")
    s.input("hx_factor", "Heat-exchanger factor F_R′/F_R", 1, "–", "1 = direct loop, as the scenario",
            number_format="0.000")
    s.result("frp_ul", "F_R′·U_L", "{fr_ul}*{hx_factor}", "W/(m²·K)", "enters FCHART_X", number_format="0.000")
    s.result("frp_ta", "F_R′·(τα)_n", "{fr_ta}*{hx_factor}", "–", "enters FCHART_Y", number_format="0.000")
    s.input("angle_rep", "Representative incidence angle", 50, "°", "invented, for the monthly mean")
    s.result("ta_ratio", "(τα)‾/(τα)_n", "COLL_IAM({angle_rep};{b0})", "–", "COLL_IAM; ≈0.94 common practice",
             number_format="0.000")
    s.input("tank", "Store volume", TANK_VOLUME, "m³", "invented (scenario)")
    s.result("storage_per_m2", "Storage per m² of collector", "{tank}*1000/{collector_area}", "l/m²",
             "f-chart standard: 75 l/m²", number_format="0.0")
    s.result("storage_check", "Storage per m² within 37.5..300 l/m²?",
             'IF(AND({storage_per_m2}>=37.5;{storage_per_m2}<=300);"yes";"NO – outside the f-chart")', "",
             "range of FCHART_STORAGE_CORR")
    s.result("storage_corr", "Storage correction of X", "FCHART_STORAGE_CORR({storage_per_m2})", "–",
             "(M/75)^−0.25", number_format="0.000")
    s.note("Per month: X = FCHART_X(area; F_R′U_L; Ta; days; L)·storage correction·DHW correction and "
           "Y = FCHART_Y(area; F_R′(τα)_n; (τα)‾/(τα)_n; H_T; days; L), with L and H_T converted to J "
           "(GJ·1E9, MJ·1E6). FCHART_DHW_CORR holds for mains 5..20 °C and set-point 50..70 °C; FCHART_F for "
           "0 ≤ X ≤ 18 and 0 ≤ Y ≤ 3. The solar contribution of the month is f·L.")
    s.table([
        Column("month_f", "Month", "", formula="{month}"),
        Column("dhw_corr", "DHW correction of X", "–", formula="FCHART_DHW_CORR({t_mains};{t_set};{t_amb})",
               number_format="0.000"),
        Column("x", "X, corrected", "–",
               formula="FCHART_X({collector_area};{frp_ul};{t_amb};{days};{load}*1E9)*{storage_corr}*{dhw_corr}",
               number_format="0.000"),
        Column("y", "Y", "–", formula="FCHART_Y({collector_area};{frp_ta};{ta_ratio};{ht}*1E6;{days};{load}*1E9)",
               number_format="0.000"),
        Column("f", "Solar fraction f", "–", formula="FCHART_F({x};{y})", number_format="0.000", width=NARROW),
        Column("load_f", "Load L", "GJ", formula="{load}", number_format="0.000", width=NARROW),
        Column("solar", "Solar f·L", "GJ", formula="{f}*{load}", number_format="0.000", width=NARROW),
    ], 12, group="months", header_lines=3)
    s.result("range_check", "All months within the ranges of the f-chart?",
             'IF(AND(MIN({x})>=0;MAX({x})<=18;MIN({y})>=0;MAX({y})<=3;MIN({t_mains})>=5;MAX({t_mains})<=20;'
             '{t_set}>=50;{t_set}<=70);"yes";"NO – see the ranges above")', "", "X, Y, mains and set-point")
    s.result("annual_solar", "Annual solar contribution Σ f·L", "SUM({solar})", "GJ", number_format="0.00")
    s.result("annual_solar_fraction", "Annual solar fraction Σ f·L / Σ L", "{annual_solar}/{annual_load}", "–",
             "key result of the sizing", number_format="0.000", named=True)
    s.result("specific_yield", "Solar contribution per m² of collector", "{annual_solar}*1E9/3.6E6/{collector_area}",
             "kWh/(m²·a)", "GJ → kWh: ×1E9/3.6E6", number_format="0")
    s.result("system_efficiency", "Share of the plane's irradiation delivered",
             "{specific_yield}/{annual_tilted_irradiation}", "–", "yearly mean", number_format="0.000")
    s.chart("monthly_solar", "Monthly hot-water load and solar contribution", "month_f", ["load_f", "solar"], "Month",
            "GJ per month", kind="column", height_rows=16)
    s.space()

    # -- 6 -------------------------------------------------------------------------------------------------
    s.page_break()
    s.heading("6  Annual solar fraction against collector area")
    s.note("Method: the chain of section 5 repeated for other field sizes with the same store, so both the area "
           "and the storage correction change. The options must keep the storage per m² within 37.5..300 l/m²: "
           "with the scenario's 2.0 m³ store that is 3 to 22 modules. Include the proposed count to see it marked.")
    s.table([
        Column("opt_modules", "Modules", "–", values=SIZE_OPTIONS, number_format="0"),
        Column("opt_area", "Area", "m²", formula="{opt_modules}*{module_area}", number_format="0.00"),
        Column("opt_storage", "Storage per m²", "l/m²", formula="{tank}*1000/{opt_area}", number_format="0.0"),
        Column("opt_corr", "Storage corr. of X", "–", formula="FCHART_STORAGE_CORR({opt_storage})",
               number_format="0.000"),
    ], len(SIZE_OPTIONS), group="options", header_lines=3)
    s.note("Monthly solar fraction f of each option (columns) – the same formulas as in section 5 with the "
           "option's area and storage correction.")
    grid = []
    for j in range(len(SIZE_OPTIONS)):
        area, corr = s.cell_of("opt_area", j), s.cell_of("opt_corr", j)
        grid.append(Column(
            "grid%d" % j, "f, option %d" % (j + 1), "–",
            formula="FCHART_F(FCHART_X(%s;{frp_ul};{t_amb};{days};{load}*1E9)*%s*{dhw_corr};"
                    "FCHART_Y(%s;{frp_ta};{ta_ratio};{ht}*1E6;{days};{load}*1E9))" % (area, corr, area),
            number_format="0.000", width=NARROW if j + 1 >= 4 else None))
    s.table([Column("month_grid", "Month", "", formula="{month}")] + grid, 12, group="months",
            header_lines=3)
    for j in range(len(SIZE_OPTIONS)):
        s.header_formula("grid%d" % j, '"f at "&TEXT(%s;"0.0")&" m²"' % s.cell_of("opt_area", j))
    s.space()
    s.table([
        Column("opt_area_again", "Area", "m²", formula="{opt_area}", number_format="0.00"),
        Column("opt_fraction", "Annual solar fraction", "–",
               formula=lambda j: "SUMPRODUCT({grid%d};{load})/{annual_load}" % j, number_format="0.000"),
        Column("opt_solar", "Solar f·L, year", "GJ", formula="{opt_fraction}*{annual_load}",
               number_format="0.00"),
        Column("opt_mark", "Proposed field", "", formula='IF({opt_modules}={modules};"◄ proposed";"")'),
        Column("opt_proposed", "Proposed field", "–",
               formula='IF({opt_modules}={modules};{opt_fraction};"")', number_format="0.000", width=NARROW),
    ], len(SIZE_OPTIONS), group="options", header_lines=3)
    chart = s.chart("fraction_area", "Annual solar fraction against collector area, same store",
                    "opt_area_again", ["opt_fraction", "opt_proposed"], "Collector area [m²]",
                    "Annual solar fraction [–]", height_rows=16)
    mark_point(chart, 2)
    s.space()

    # -- 7 -------------------------------------------------------------------------------------------------
    s.page_break()
    s.heading("7  Stagnation check")
    s.note("Method: COLL_STAGNATION_TEMP finds the mean fluid temperature at which the efficiency curve of "
           "section 4 falls to zero: the collector in full sun with no heat drawn (pump stopped, store at its "
           "limit, power cut). It extrapolates the curve far beyond its test range: an estimate, not a "
           "measured stagnation temperature.")
    s.input("g_stag", "Irradiance on the plane, high summer", 1000, "W/m²", "invented", number_format="0")
    s.input("t_amb_stag", "Ambient temperature, hot day", 32, "°C", "invented")
    s.result("stagnation_temperature", "Stagnation temperature of the collectors",
             "COLL_STAGNATION_TEMP({eta0};{a1};{a2};{t_amb_stag};{g_stag})", "°C", "from the test curve",
             number_format="0.0", named=True)
    s.result("stagnation_pressure", "Water's boiling pressure at that temperature",
             "WATER_SAT_PRESSURE({stagnation_temperature})/1E5", "bar abs.",
             "a water-filled loop boils below it", number_format="0.0")
    s.note("What it means: at stagnation the absorber, the collector outlet and the nearby pipes reach this "
           "temperature; water or glycol in them boils unless the loop pressure exceeds the boiling pressure, "
           "and steam pushes fluid into the expansion vessel. Collector, insulation, seals, valves and the "
           "heat-transfer fluid must be rated for it; the expansion vessel must take the steam volume; glycol "
           "degrades when repeatedly overheated. A loop must never be left to stagnate without a designed way of "
           "shedding heat (drain-back, heat dump or night cooling). Sizing and protection follow the local codes "
           "and the collector maker's instructions, by a licensed installer.")

    # -- 8 -------------------------------------------------------------------------------------------------
    s.space()
    s.heading("8  Notes")
    s.notes(CAUTIONS + [
        "f-chart limits: a monthly correlation fitted to simulations of standard systems; it ignores day-to-day "
        "weather, the draw profile, store stratification and pipe losses, and counts only the load of heating "
        "the drawn water. Treat the annual fraction as an estimate to compare sizes, not a guaranteed yield; an "
        "hourly simulation (SIM_YEAR) is the next check.",
        "Oversizing: the larger the field, the more summer days it has nothing to give the store and stagnates; "
        "in section 6 the largest options reach f = 1 in July. Keeping the sunniest month just below full "
        "coverage is common practice for hot-water systems.",
        "Freeze protection: with a January mean near 0 °C the collector loop freezes on clear nights. A glycol "
        "loop lowers cp (GLYCOL_CP) and adds an exchanger (HX_COLLECTOR_PENALTY), both of which reduce F_R′ "
        "and the solar fraction; a drain-back loop avoids glycol. Defer to local codes.",
        "Laundry specifics: machines may need water hotter than the set-point; temperatures above it come from "
        "the auxiliary heater. Mixing valves and Legionella measures as local rules require.",
        "All inputs are invented for this example: no measured climate, no real product's test data.",
    ])
