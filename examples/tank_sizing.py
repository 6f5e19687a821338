"""Tank sizing: from the laundry's daily draw to the volume, insulation, overnight cool-down and
pipe losses of its hot-water store, and a phase-change store for comparison.

Every figure is INVENTED (the shared scenario in scenario.py plus the invented inputs below).
"""
import scenario as sc
from workbook import (CAUTIONS, HEADING_COLOUR, INPUT_COLOUR, RESULT_COLOUR, ROW_HEIGHT, BOLD, Column, Sheet,
                      column_letter)

FILE = "tank-sizing.fods"

J_PER_KWH = "3.6E6"


# -- local helpers (candidates for workbook.py) ------------------------------------------------------
def runs_table(s, names, rows, header="Run"):
    """A table turned on its side: one column per item (names, in columns B, C, ...), one row per
    quantity, so several pipe runs fit the four columns of the sheet. Each row is
    (key, label, unit, cells, number_format) with one cell per item: a number (an input, yellow) or a
    formula template starting with "=" (green) in which {key} of a row of this table names the same
    item's cell, and any other key the sheet's cell or range. Afterwards {key} of a row names its whole
    row of cells, e.g. SUM({key})."""
    sheet = s.sheet
    header_row = s.row
    cell = s._cell(0)
    cell.setString(header)
    for j, name in enumerate(names):
        s._cell(1 + j).setString(name)
    block = sheet.getCellRangeByPosition(0, header_row, len(names), header_row)
    block.CellBackColor = HEADING_COLOUR
    block.CharWeight = BOLD
    block.IsTextWrapped = True
    sheet.Rows.getByIndex(header_row).Height = 3 * ROW_HEIGHT
    first = header_row + 1
    own = {key: first + i for i, (key, *_rest) in enumerate(rows)}
    for key in own:
        assert key not in s.cells and key not in s.columns, key
    for i, (key, label, unit, cells, number_format) in enumerate(rows):
        row = first + i
        assert len(cells) == len(names), key
        s._cell(0, row).setString("%s [%s]" % (label, unit) if unit else label)
        for j, value in enumerate(cells):
            target = s._cell(1 + j, row)
            if isinstance(value, str):
                template = value[1:]
                for other, other_row in own.items():
                    template = template.replace("{%s}" % other, "%s%d" % (column_letter(1 + j), other_row + 1))
                target.setFormula("=" + s.expand(template))
                target.CellBackColor = RESULT_COLOUR
            else:
                target.setValue(value)
                target.CellBackColor = INPUT_COLOUR
            target.NumberFormat = s.number_format(number_format)
    for key, row in own.items():
        s.cells[key] = "$B$%d:$%s$%d" % (row + 1, column_letter(len(names)), row + 1)
    s.row = first + len(rows)
    return first, s.row - 1


# -- the workbook --------------------------------------------------------------------------------------
def build(document):
    sheet = document.Sheets.getByIndex(0)
    sheet.Name = "Tank sizing"
    s = Sheet(document, sheet)
    s.title("Tank sizing – %s (invented)" % sc.CLIENT, sc.SCENARIO)

    # 1 ---------------------------------------------------------------------------------------------
    coldest = min(range(12), key=lambda m: sc.T_MAINS[m])
    coldest_air = min(range(12), key=lambda m: sc.T_AMBIENT_MEAN[m])
    s.heading("1  Daily draw profile of the laundry")
    s.note("Method: no Solarith function; litres in an hour = the hour's share × the daily draw (the "
           "scenario's invented use).")
    s.input("daily_litres", "Daily hot-water draw", sc.DAILY_DRAW_LITRES, "l/day",
            "scenario, at the delivery set-point")
    s.input("t_set", "Delivery set-point", sc.T_SET, "°C", "scenario")
    s.input("t_mains", "Mains water temperature, winter design", sc.T_MAINS[coldest], "°C",
            "scenario: coldest month (%s)" % sc.MONTHS[coldest])
    s.table([Column("hour", "Hour starting", "h", values=list(range(24)), number_format="00\":00\""),
             Column("share", "Share of the daily draw", "–", values=sc.HOURLY_DRAW_SHARE, number_format="0%"),
             Column("litres_h", "Draw in the hour", "l/h", formula="{share}*{daily_litres}", number_format="0")],
            24)
    s.result("share_sum", "Hourly draws added up ÷ daily draw", "SUM({litres_h})/{daily_litres}", "–",
             "check: must be 1", number_format="0.000")
    s.result("peak_litres", "Largest hourly draw", "MAX({litres_h})", "l/h", number_format="0")
    s.result("draw_hours", "Hours with a draw", 'COUNTIF({share};">0")', "h/day", number_format="0")
    first = s.row
    s.chart("draw_profile", "Hot-water draw over the day (invented profile)", "hour", ["litres_h"],
            "hour of the day", "draw [l/h]", kind="column", height_rows=12)
    s.keep(first)
    s.space()

    # 2 ---------------------------------------------------------------------------------------------
    s.blocks.append((s.row, s.row + 1))  # keep the heading with its method note
    s.heading("2  Energy of a day's draw, and what the store should hold")
    s.note("Method: STORE_WATER (IAPWS-IF97 density and enthalpy of water) heats the day's water from the "
           "mains temperature to the set-point. STORE_WATER takes the volume at its start temperature, so the "
           "volume drawn at the set-point is first converted to the same mass at mains temperature "
           "(WATER_DENSITY).")
    s.result("v_draw_set", "Daily volume at the set-point", "{daily_litres}/1000", "m³", number_format="0.000")
    s.result("v_draw_mains", "Same mass of water at mains temperature", "{v_draw_set}*WATER_DENSITY({t_set})/"
             "WATER_DENSITY({t_mains})", "m³", "volume × ρ(set-point)/ρ(mains)", number_format="0.0000")
    s.result("daily_draw_energy", "Energy of a day's hot water", "STORE_WATER({v_draw_mains};{t_mains};{t_set})/"
             + J_PER_KWH, "kWh/day", "mains → set-point, winter design", number_format="0.00", named=True)
    s.note("Invented design choice: the store holds one full day's hot-water energy, so that a sunny day's "
           "collection can still serve the next morning's draw.")
    s.input("store_fraction", "Part of a day's energy the store must hold", 1.0, "–",
            "invented design choice", number_format="0%")
    s.result("store_energy", "Energy the store should hold", "{store_fraction}*{daily_draw_energy}", "kWh",
             number_format="0.00", named=True)
    s.space()

    # 3 ---------------------------------------------------------------------------------------------
    s.heading("3  Tank volume")
    s.note("Method: STORE_TANK_VOLUME, the inverse of STORE_WATER: the volume of hot water that releases the "
           "stored energy when it cools from the charged to the discharged temperature.")
    s.input("t_hot", "Charged store temperature", 70, "°C", "invented: solar charging up to 70 °C")
    s.input("t_cold", "Discharged store temperature", 25, "°C",
            "invented: store counts as empty")
    s.result("tank_volume_required", "Tank volume required", "STORE_TANK_VOLUME({store_energy}*" + J_PER_KWH +
             ";{t_hot};{t_cold})", "m³", "volume of the hot water", number_format="0.000", named=True)
    s.input("v_proposed", "Tank volume proposed in the scenario", sc.TANK_VOLUME, "m³", "scenario")
    s.result("proposed_ratio", "Proposed ÷ required", "{v_proposed}/{tank_volume_required}", "–",
             number_format="0.00")
    s.input("v_tank", "Chosen standard tank size", 2.0, "m³",
            "invented steps 1.5/2.0/2.5/3.0 m³", number_format="0.0")
    s.result("size_check", "Chosen size covers the requirement?", 'IF({v_tank}>={tank_volume_required};'
             '"yes";"NO – choose a larger size")', "", "chosen ≥ required")
    s.result("water_store_energy", "Energy the chosen tank holds", "-STORE_WATER({v_tank};{t_hot};{t_cold})/"
             + J_PER_KWH, "kWh", "charged → discharged", number_format="0.00", named=True)
    s.result("store_days", "That is, in days of winter draw", "{water_store_energy}/{daily_draw_energy}", "days",
             number_format="0.00")
    s.space()

    # 4 ---------------------------------------------------------------------------------------------
    s.heading("4  Geometry and heat-loss coefficient")
    s.note("Method: a vertical cylinder, D = √(4·V/(π·H)); STORE_TANK_UA sums the side wall (cylindrical shell "
           "plus outer film) and both flat ends (plane layer plus film); the inner film and the steel wall are "
           "neglected.")
    s.input("tank_height", "Height of the water in the tank", sc.TANK_HEIGHT, "m", "scenario")
    s.result("tank_diameter", "Inside diameter", "SQRT(4*{v_tank}/(PI()*{tank_height}))", "m",
             "from volume and height", number_format="0.000")
    s.result("tank_area", "Water-side surface (wall and two ends)", "PI()*{tank_diameter}*{tank_height}+"
             "2*PI()*{tank_diameter}^2/4", "m²", number_format="0.00")
    s.input("ins_thickness", "Insulation thickness", sc.TANK_INSULATION, "m", "scenario", number_format="0.000")
    s.input("ins_k", "Insulation conductivity", sc.TANK_INSULATION_K, "W/(m·K)",
            "scenario (common practice)", number_format="0.000")
    s.input("h_out", "Outer surface coefficient", 10, "W/(m²·K)",
            "invented: still air, radiation incl.")
    s.result("tank_ua", "Heat-loss coefficient UA", "STORE_TANK_UA({tank_diameter};{tank_height};{ins_thickness};"
             "{ins_k};{h_out})", "W/K", number_format="0.000", named=True)
    s.result("tank_u", "Mean U on the water-side surface", "{tank_ua}/{tank_area}", "W/(m²·K)",
             number_format="0.000")
    s.input("t_room", "Plant-room temperature", sc.T_PLANT_ROOM, "°C", "scenario, air around the tank")
    s.note("Effect of the insulation thickness (same tank, same conductivity; standing loss with the whole tank at "
           "the charged temperature):")
    s.table([Column("thick", "Insulation thickness", "m", values=[0.025, 0.05, 0.075, 0.10, 0.15, 0.20],
                    number_format="0.000"),
             Column("ua_thick", "UA", "W/K", formula="STORE_TANK_UA({tank_diameter};{tank_height};{thick};{ins_k};"
                    "{h_out})", number_format="0.00"),
             Column("loss_thick", "Standing loss", "W", formula="{ua_thick}*({t_hot}-{t_room})",
                    number_format="0"),
             Column("kwh_thick", "Standing loss per day", "kWh/day", formula="{loss_thick}*24/1000",
                    number_format="0.00")], 6)
    first = s.row
    s.chart("ua_thickness", "Heat-loss coefficient vs insulation thickness", "thick", ["ua_thick"],
            "insulation thickness [m]", "UA [W/K]", height_rows=12)
    s.keep(first)
    s.space()

    # 5 ---------------------------------------------------------------------------------------------
    cooldown_block = s.row
    s.heading("5  Overnight cool-down and standing loss")
    s.note("Method: STORE_COOLDOWN, a fully mixed tank losing UA·(T − T_room) with the specific heat of water "
           "varying with temperature (exact integration). A stratified tank keeps its top warmer than this. "
           "For contrast the same tank without insulation (STORE_TANK_UA with thickness 0: outer film only).")
    s.result("t_start", "Store temperature when the last draw ends", "{t_hot}", "°C",
             "assumed fully charged (section 3)", number_format="0.0")
    s.result("night_hours", "Night without draws", "24-{draw_hours}", "h", "from the draw profile",
             number_format="0")
    s.result("ua_bare", "UA of the same tank uninsulated", "STORE_TANK_UA({tank_diameter};{tank_height};0;{ins_k};"
             "{h_out})", "W/K", "outer film only", number_format="0.0")
    s.table([Column("hours", "Hours since the last draw", "h", values=list(range(0, 25, 2)), number_format="0"),
             Column("t_ins", "Insulated", "°C", formula="STORE_COOLDOWN({t_start};{t_room};{tank_ua};{v_tank};"
                    "{hours}*3600)", number_format="0.00"),
             Column("t_bare", "Bare tank", "°C", formula="STORE_COOLDOWN({t_start};{t_room};{ua_bare};"
                    "{v_tank};{hours}*3600)", number_format="0.0"),
             Column("q_lost", "Heat lost, insulated", "kWh", formula="-STORE_WATER({v_tank};{t_start};{t_ins})/"
                    + J_PER_KWH, number_format="0.00")], 13)
    s.chart("cooldown", "Tank temperature standing without draws", "hours", ["t_ins", "t_bare"],
            "hours since the last draw [h]", "mixed tank temperature [°C]", height_rows=16)
    s.keep(cooldown_block)
    s.result("temperature_after_night", "Tank temperature after the night", "STORE_COOLDOWN({t_start};{t_room};"
             "{tank_ua};{v_tank};{night_hours}*3600)", "°C", "insulated tank", number_format="0.00", named=True)
    s.result("night_loss", "Heat lost over the night", "-STORE_WATER({v_tank};{t_start};{temperature_after_night})/"
             + J_PER_KWH, "kWh", number_format="0.00")
    s.result("standing_loss_w", "Standing loss at the charged temperature", "{tank_ua}*({t_start}-{t_room})", "W",
             "UA·(T − T_room)", number_format="0.0", named=True)
    s.result("standing_loss_day", "Standing loss per day", "{standing_loss_w}*24/1000", "kWh/day",
             "upper bound (tank not hot all day)", number_format="0.00")
    s.result("standing_share", "… as a share of the day's draw energy", "{standing_loss_day}/{daily_draw_energy}",
             "–", number_format="0.0%")
    s.space()

    # 6 ---------------------------------------------------------------------------------------------
    s.heading("6  Heat lost by the connecting pipes")
    s.note("Method: LOSS_PIPE, the steady loss per metre of a horizontal pipe through its insulation to the air "
           "(Churchill–Chu free convection, with wind combined with Churchill–Bernstein forced convection) and "
           "by radiation to the surroundings. Runs, lengths, sizes and insulation are invented.")
    s.input("t_outdoor", "Outdoor air while the collectors run", sc.T_AMBIENT_MEAN[coldest_air], "°C",
            "scenario: %s mean (winter design)" % sc.MONTHS[coldest_air], number_format="0.0")
    s.input("eps_jacket", "Emissivity of the insulation jacket", 0.9, "–", "invented, a dark jacket")
    s.input("eps_bare", "Emissivity of a bare, dull copper pipe", 0.6, "–", "invented, for the comparison")
    s.input("pump_hours", "Collector loop hot, winter sunny day", 6, "h/day", "invented")
    s.space()
    s.note("Runs: roof hot leg = collector outlet → tank, outdoors; roof cold leg = tank → collector inlet, "
           "outdoors; distribution = tank → laundry, indoors in plant-room air.")
    runs = ["Roof hot leg", "Roof cold leg", "Distribution"]
    runs_table(s, runs, [
        ("p_len", "Length", "m", [18, 18, 25], "0.0"),
        ("p_od", "Pipe outer diameter", "m", [0.028, 0.028, 0.035], "0.000"),
        ("p_ins", "Insulation thickness", "m", [0.025, 0.025, 0.030], "0.000"),
        ("p_k", "Insulation conductivity", "W/(m·K)", [0.040, 0.040, 0.035], "0.000"),
        ("p_tf", "Fluid temperature", "°C", [65, 40, "={t_set}"], "0.0"),
        ("p_ta", "Air around the pipe", "°C", ["={t_outdoor}", "={t_outdoor}", "={t_room}"], "0.0"),
        ("p_wind", "Wind across the pipe", "m/s", [4, 4, 0], "0.0"),
        ("p_hours", "Hours hot per day", "h/day", ["={pump_hours}", "={pump_hours}", "={draw_hours}"], "0"),
        ("p_wm", "Loss, insulated", "W/m",
         ["=LOSS_PIPE({p_tf};{p_ta};{p_od};{p_ins};{p_k};{eps_jacket};{p_wind})"] * 3, "0.00"),
        ("p_wm_bare", "Loss, bare pipe", "W/m",
         ["=LOSS_PIPE({p_tf};{p_ta};{p_od};0;{p_k};{eps_bare};{p_wind})"] * 3, "0.0"),
        ("p_w", "Run loss, insulated", "W", ["={p_wm}*{p_len}"] * 3, "0"),
        ("p_w_bare", "Run loss, bare pipe", "W", ["={p_wm_bare}*{p_len}"] * 3, "0"),
        ("p_kwh", "Energy lost, insulated", "kWh/day", ["={p_w}*{p_hours}/1000"] * 3, "0.00"),
        ("p_kwh_bare", "Energy lost, bare pipe", "kWh/day", ["={p_w_bare}*{p_hours}/1000"] * 3, "0.00"),
    ], header="Run (invented)")
    s.note("Hours hot: the collector loop while its pump runs (invented), the distribution while the laundry draws "
           "(hours with a draw, section 1). The bare rows use the same runs without insulation.")
    s.result("pipe_loss_total", "Total pipe loss, insulated", "SUM({p_w})", "W", "while all runs are hot",
             number_format="0", named=True)
    s.result("pipe_loss_day", "Pipe loss per day, insulated", "SUM({p_kwh})", "kWh/day", number_format="0.00",
             named=True)
    s.result("pipe_loss_bare", "Total pipe loss, bare pipes", "SUM({p_w_bare})", "W", number_format="0")
    s.result("pipe_loss_bare_day", "Pipe loss per day, bare pipes", "SUM({p_kwh_bare})", "kWh/day",
             number_format="0.00")
    s.result("pipe_saving", "Loss avoided by the insulation", "1-{pipe_loss_day}/{pipe_loss_bare_day}", "–",
             number_format="0%")
    s.result("pipe_share", "Insulated pipe loss as a share of the day's draw", "{pipe_loss_day}/{daily_draw_energy}",
             "–", number_format="0.0%")
    s.space()

    # 7 ---------------------------------------------------------------------------------------------
    s.heading("7  A phase-change store compared with water")
    s.note("Method: STORE_PCM adds the sensible heat of the solid, the latent heat at the melting point and the "
           "sensible heat of the liquid; water by STORE_WATER. Same temperature swing as the water store "
           "(section 3). The material is an invented salt hydrate; all its properties are invented.")
    s.input("pcm_melt", "PCM melting temperature", 58, "°C", "invented")
    s.input("pcm_latent", "Latent heat of melting", 220000, "J/kg", "invented", number_format="0")
    s.input("pcm_cp_solid", "Specific heat, solid", 2000, "J/(kg·K)", "invented", number_format="0")
    s.input("pcm_cp_liquid", "Specific heat, liquid", 2800, "J/(kg·K)", "invented", number_format="0")
    s.input("pcm_density", "Density (mean of solid and liquid)", 1500, "kg/m³", "invented", number_format="0")
    s.result("pcm_per_kg", "Heat stored per kg of PCM", "STORE_PCM(1;{pcm_cp_solid};"
             "{pcm_cp_liquid};{pcm_melt};{pcm_latent};{t_cold};{t_hot})", "J/kg", number_format="0")
    s.result("pcm_mass", "PCM mass for the water tank's energy", "{water_store_energy}*" + J_PER_KWH +
             "/{pcm_per_kg}", "kg", number_format="0")
    s.result("pcm_volume_for_same_energy", "Volume of that material", "{pcm_mass}/{pcm_density}", "m³",
             "material only, no containers", number_format="0.000", named=True)
    s.result("pcm_volume_ratio", "Material volume ÷ water tank volume", "{pcm_volume_for_same_energy}/{v_tank}",
             "–", number_format="0.00")
    pcm_block = s.row
    s.note("Energy per cubic metre and per kilogram of water and of the phase-change material (PCM), charged "
           "at the charged store temperature (section 3) and "
           "discharged down to the temperature in the first column. Water per m³ of hot water.")
    s.table([Column("t_low", "Discharged to", "°C", values=[65, 60, 58, 55, 50, 45, 40, 35, 30, 25],
                    number_format="0"),
             Column("water_m3", "Water", "kWh/m³", formula="-STORE_WATER(1;{t_hot};{t_low})/" + J_PER_KWH,
                    number_format="0.0"),
             Column("pcm_m3", "PCM", "kWh/m³", formula="STORE_PCM({pcm_density};{pcm_cp_solid};"
                    "{pcm_cp_liquid};{pcm_melt};{pcm_latent};{t_low};{t_hot})/" + J_PER_KWH, number_format="0.0"),
             Column("ratio_m3", "PCM ÷ water, per m³", "–", formula="{pcm_m3}/{water_m3}",
                    number_format="0.00")], 10, group="swings")
    s.table([
        Column("t_low_kg", "Discharged to", "°C", formula="{t_low}", number_format="0"),
        Column("water_kg", "Water", "Wh/kg", formula="-STORE_WATER(1;{t_hot};{t_low})/WATER_DENSITY({t_hot})/3600",
               number_format="0.0"),
        Column("pcm_kg", "PCM", "Wh/kg", formula="STORE_PCM(1;{pcm_cp_solid};{pcm_cp_liquid};"
               "{pcm_melt};{pcm_latent};{t_low};{t_hot})/3600", number_format="0.0"),
        Column("ratio_kg", "PCM ÷ water, per kg", "–", formula="{pcm_kg}/{water_kg}", number_format="0.00")],
        10, group="swings")
    s.chart("pcm_vs_water", "Heat stored per m³, charged at the store's charged temperature", "t_low",
            ["water_m3", "pcm_m3"], "discharged to [°C]", "energy [kWh/m³]", height_rows=16)
    s.keep(pcm_block)
    s.note("Reading: the material gains most over narrow swings that cross its melting point; for swings above "
           "the melting point (discharged to 60 or 65 °C) it stores only the sensible heat of its liquid and "
           "does no better than water. Containers, heat exchange into and out of the solid, and ageing of the "
           "material are not in these figures.")
    s.space()

    # 8 ---------------------------------------------------------------------------------------------
    s.heading("8  Notes and cautions")
    s.result("expansion", "Expansion of the water, mains → charged", "{v_tank}*(WATER_DENSITY({t_mains})/"
             "WATER_DENSITY({t_hot})-1)*1000", "l", "V·(ρ(mains)/ρ(charged) − 1)",
             number_format="0.0")
    s.text_result("Method of STORE_COOLDOWN", 'FN_METHOD("STORE_COOLDOWN")')
    s.notes(CAUTIONS + [
        "Legionella in this store: a solar store spends long hours lukewarm, where Legionella multiplies. Keep "
        "the outlet to the laundry at the set-point by an after-heater and heat the "
        "whole store, bottom included, as often and as hot as local rules prescribe (common practice: a regular "
        "heat-up to 60 °C or more).",
        "Scalding: the store is charged above the delivery set-point and may go hotter on long sunny days. "
        "Thermostatic mixing valves limit the temperature where people touch the water; the laundry's machines "
        "take it as their makers specify.",
        "Relief and expansion: a pressurised tank needs a combined pressure and temperature relief valve on the tank "
        "itself, its discharge piped to a safe, visible drain, and an expansion vessel or relief that takes the "
        "expansion above (sized to the applicable code, which also covers the collector loop's own vessel).",
        "Phase-change material: salt hydrates can corrode metals, cool below their melting point before they "
        "freeze, and separate into phases over many cycles (from memory). The material in section 7 is invented; "
        "a real one needs its maker's data and its own containment.",
        "Pipe runs outdoors need UV-resistant jackets and insulation rated for the collector's stagnation "
        "temperature; the losses above exclude fittings, valves and supports, which add to them.",
    ])
    s.paginate()
