#!/usr/bin/python3
"""Builds the example workbooks (flat ODF, .fods) from the descriptions below,
in a throwaway office with Solarith installed, so that the workbooks stay
reviewable in git: this script is the source, the .fods files its output.

    /usr/bin/python3 examples/build_examples.py build/solarith.oxt

Every scenario here is invented: the client, the site and all figures.
"""
import os
import sys

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, os.path.join(HERE, "..", "packaging"))
from office import Office  # noqa: E402

# Cell colours: inputs, results and notes must be told apart at a glance.
INPUT_COLOUR = 0xFFF2CC
RESULT_COLOUR = 0xE2F0D9
HEADING_COLOUR = 0xD9E1F2
NOTE_COLOUR = 0xF2F2F2

CAUTIONS = [
    "Cautions. These figures are engineering estimates for an invented scenario; they do not replace a design "
    "checked against the applicable codes and standards by a licensed professional, whose judgement prevails.",
    "Absorber plates, pipes and tanks reach temperatures that burn skin on contact; collectors can stagnate far "
    "above 100 °C when no heat is drawn.",
    "Water stored above 60 °C scalds: fit a thermostatic mixing valve at the outlets as local codes require. "
    "Water stored too cool can grow Legionella; follow the local rules on storage temperatures.",
    "Closed circuits need pressure relief and expansion sized to code; circuits exposed to frost need freeze "
    "protection.",
]


class Sheet:
    """Writes a calculation sheet row by row: label | value | unit | source or note."""

    def __init__(self, document, sheet):
        self.document = document
        self.sheet = sheet
        self.row = 0
        self.names = {}
        for column, width in enumerate((7600, 2400, 2000, 6200)):
            sheet.Columns.getByIndex(column).Width = width  # 1/100 mm
        page = document.StyleFamilies.getByName("PageStyles").getByName(sheet.PageStyle)
        page.ScaleToPagesX = 1  # print one page wide
        page.ScaleToPagesY = 0

    def _cell(self, column, row=None):
        return self.sheet.getCellByPosition(column, self.row if row is None else row)

    def _fill(self, colour, columns=4):
        cells = self.sheet.getCellRangeByPosition(0, self.row, columns - 1, self.row)
        cells.CellBackColor = colour

    def _full_width(self, text_or_formula, characters_per_line=80):
        """Text across columns A..D of the current row, wrapped, the row made tall enough."""
        cells = self.sheet.getCellRangeByPosition(0, self.row, 3, self.row)
        cells.merge(True)
        cells.IsTextWrapped = True
        cell = self._cell(0)
        if text_or_formula.startswith("="):
            cell.setFormula(text_or_formula)
        else:
            cell.setString(text_or_formula)
        lines = max(1, -(-len(cell.getString()) // characters_per_line))
        self.sheet.Rows.getByIndex(self.row).Height = 120 + 420 * lines  # 1/100 mm
        return cells

    def title(self, text, subtitle):
        self._cell(0).setString(text)
        self._cell(0).CharHeight = 14
        self._cell(0).CharWeight = 150  # bold
        self.row += 1
        self._full_width(subtitle).CharPosture = 2  # italic
        self.row += 2

    def heading(self, text):
        self._fill(HEADING_COLOUR)
        self._cell(0).setString(text)
        self._cell(0).CharWeight = 150
        self.row += 1

    def ref(self, key):
        return "B%d" % (self.names[key] + 1)

    def _row(self, key, label, unit, note, colour):
        self._cell(0).setString(label)
        self._cell(2).setString(unit)
        self._cell(3).setString(note)
        self._fill(colour)
        if key:
            self.names[key] = self.row

    def input(self, key, label, value, unit, note=""):
        self._row(key, label, unit, note, INPUT_COLOUR)
        self._cell(1).setValue(value)
        self.row += 1

    def result(self, key, label, formula, unit, note="", number_format="0.00", named=False):
        self._row(key, label, unit, note, RESULT_COLOUR)
        cell = self._cell(1)
        cell.setFormula("=" + formula.format(**{k: self.ref(k) for k in self.names}))
        cell.NumberFormat = self._format(number_format)
        cell.CharWeight = 150
        if named:
            self.document.NamedRanges.addNewByName(key, "$'%s'.$B$%d" % (self.sheet.Name, self.row + 1),
                                                   self._address(), 0)
        self.row += 1

    def text_result(self, label, formula):
        """A label row, then the formula's text across the full width below it."""
        self._row(None, label, "", "", RESULT_COLOUR)
        self.row += 1
        self.document.calculateAll()  # the text's length sets the row height
        self._full_width("=" + formula).CellBackColor = RESULT_COLOUR
        self.row += 1

    def notes(self, lines):
        self.row += 1
        for line in lines:
            cells = self._full_width(line)
            cells.CharPosture = 2
            cells.CellBackColor = NOTE_COLOUR
            self.row += 1

    def space(self):
        self.row += 1

    def _address(self):
        from com.sun.star.table import CellAddress
        address = CellAddress()
        address.Sheet = 0
        return address

    def _format(self, code):
        formats = self.document.NumberFormats
        from com.sun.star.lang import Locale
        locale = Locale()
        key = formats.queryKey(code, locale, False)
        return key if key != -1 else formats.addNew(code, locale)


def quick_check(document):
    """A first look at the radiation, conduction and storage functions."""
    sheet = document.Sheets.getByIndex(0)
    sheet.Name = "Quick check"
    s = Sheet(document, sheet)
    s.title("Solarith quick check – Brackenridge Wash House (invented)",
            "Invented client and site: a small laundry in the invented town of Orrin Bay plans a roof collector "
            "and a hot-water tank. All inputs are invented for this example.")

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
    s.text_result("Check of an impossible emissivity", 'FN_DIAGNOSE("RAD_EMISSIVE";{0};1.3)'.format(
        s.ref("t_plate")))
    s.notes(CAUTIONS)


WORKBOOKS = {"quick-check.fods": quick_check}


def main():
    if len(sys.argv) != 2:
        print(__doc__, file=sys.stderr)
        return 2
    with Office(sys.argv[1]) as office:
        out = office.own_path("examples")
        for file_name, build in WORKBOOKS.items():
            document = office.new_spreadsheet()
            try:
                build(document)
                document.calculateAll()
                path = os.path.join(out, file_name)
                office.store(document, path, "OpenDocument Spreadsheet Flat XML")
                with open(path, "rb") as src, open(os.path.join(HERE, file_name), "wb") as dst:
                    dst.write(src.read())
                print("wrote", os.path.join(HERE, file_name))
            finally:
                document.close(True)
    return 0


if __name__ == "__main__":
    sys.exit(main())
