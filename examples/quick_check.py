"""Quick check: a first look at the radiation, conduction and storage functions."""
from scenario import CLIENT, SCENARIO
from workbook import CAUTIONS, Sheet

FILE = "quick-check.fods"


def build(document):
    sheet = document.Sheets.getByIndex(0)
    sheet.Name = "Quick check"
    s = Sheet(document, sheet)
    s.title("Solarith quick check – %s (invented)" % CLIENT, SCENARIO)

    s.heading("1  Absorber and cover: radiation across the air gap")
    s.input("t_plate", "Absorber plate temperature", 85, "°C", "invented operating point")
    s.input("t_cover", "Glass cover temperature", 45, "°C", "invented")
    s.input("e_selective", "Emissivity, selective absorber coating", 0.10, "–", "typical of selective coatings "
            "(common practice)")
    s.input("e_black", "Emissivity, black paint", 0.92, "–", "common practice")
    s.input("e_glass", "Emissivity, glass cover", 0.88, "–", "common practice")
    s.result("q_selective", "Radiation plate → cover, selective", "RAD_EXCHANGE_PLATES({t_plate};{t_cover};"
             "{e_selective};{e_glass})", "W/m²", "two grey parallel plates", named=True)
    s.result("q_black", "Radiation plate → cover, black paint", "RAD_EXCHANGE_PLATES({t_plate};{t_cover};"
             "{e_black};{e_glass})", "W/m²", named=True)
    s.result("saving", "Loss avoided by the selective coating", "1-{q_selective}/{q_black}", "–", number_format="0%")
    s.result("h_rad", "Radiative coefficient, selective", "RAD_COEFF({t_plate};{t_cover};{e_selective};{e_glass})",
             "W/(m²·K)")
    s.space()

    s.heading("2  Cover to sky")
    s.input("t_air", "Outdoor air temperature", 14, "°C", "invented clear evening")
    s.input("t_dew", "Dew point", 8, "°C", "invented")
    s.result("t_sky", "Clear-sky temperature", "RAD_SKY_TEMP({t_air};{t_dew})", "°C", "Berdahl–Martin", named=True)
    s.result("q_sky", "Net radiation, cover → sky", "RAD_EMISSIVE({t_cover};{e_glass})-RAD_EMISSIVE({t_sky};"
             "{e_glass})", "W/m²", "cover seen as grey, sky as its effective temperature")
    s.result("peak", "Wavelength of peak emission of the plate", "RAD_PEAK_WAVELENGTH({t_plate})", "µm", "Wien")
    s.space()

    s.heading("3  Tank wall: layers in series")
    s.input("d_steel", "Steel shell thickness", 0.003, "m", "invented")
    s.input("k_steel", "Steel conductivity", 50, "W/(m·K)", "common practice for carbon steel")
    s.input("d_foam", "Foam insulation thickness", 0.08, "m", "invented")
    s.input("k_foam", "Foam conductivity", 0.03, "W/(m·K)", "common practice for rigid polyurethane foam")
    s.input("d_jacket", "Outer jacket thickness", 0.001, "m", "invented")
    s.input("k_jacket", "Jacket conductivity", 0.2, "W/(m·K)", "invented plastic jacket")
    s.input("a_wall", "Wall area", 5.2, "m²", "invented")
    s.input("t_water", "Stored water temperature", 60, "°C", "invented")
    s.input("t_room", "Plant-room temperature", 15, "°C", "invented")
    s.result("r_wall", "Resistance of the wall", "COND_R_WALL({d_steel};{k_steel};{a_wall})+COND_R_WALL({d_foam};"
             "{k_foam};{a_wall})+COND_R_WALL({d_jacket};{k_jacket};{a_wall})", "K/W", "sum of three layers",
             number_format="0.0000")
    s.result("q_wall", "Heat loss through the wall", "({t_water}-{t_room})/{r_wall}", "W",
             "film resistances neglected (conservative)", named=True)
    s.space()

    s.heading("4  Storing a day's heat: water and a phase-change store")
    s.input("m_water", "Mass of water", 300, "kg", "invented")
    s.input("cp_water", "Specific heat of water", 4186, "J/(kg·K)", "common practice, about 4.19 kJ/(kg·K)")
    s.input("t_cold", "Lowest store temperature", 40, "°C", "invented")
    s.input("t_hot", "Highest store temperature", 70, "°C", "invented")
    s.result("e_water", "Energy stored in the water", "STORE_SENSIBLE({m_water};{cp_water};{t_cold};{t_hot})/3.6E6",
             "kWh", "J converted to kWh", named=True)
    s.input("m_pcm", "Mass of phase-change material", 120, "kg", "invented salt hydrate")
    s.input("cp_solid", "Specific heat, solid", 2000, "J/(kg·K)", "invented")
    s.input("cp_liquid", "Specific heat, liquid", 3000, "J/(kg·K)", "invented")
    s.input("t_melt", "Melting temperature", 58, "°C", "invented")
    s.input("latent", "Latent heat of melting", 230000, "J/kg", "invented")
    s.result("e_pcm", "Energy stored in the phase-change store", "STORE_PCM({m_pcm};{cp_solid};{cp_liquid};"
             "{t_melt};{latent};{t_cold};{t_hot})/3.6E6", "kWh", named=True)
    s.result("ratio", "Phase-change store vs water, per kg", "({e_pcm}/{m_pcm})/({e_water}/{m_water})", "–",
             number_format="0.00")
    s.space()

    s.heading("5  On what these numbers rest")
    s.text_result("Method of RAD_SKY_TEMP", 'FN_METHOD("RAD_SKY_TEMP")')
    s.text_result("Check of an impossible emissivity", 'FN_DIAGNOSE("RAD_EMISSIVE";{t_plate};1.3)')
    s.notes(CAUTIONS)
