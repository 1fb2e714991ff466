// The demo club's waiver (invented words for the demo; a real club uses its sanctioning body's
// and its insurer's text, checked under local law).
export const demoWaiverVersion = "brackenmoor-2026-1";

export const demoWaiverText = `Brackenmoor & District Car Club — driver's acknowledgement and waiver (demo text)

1. I know that motor sport is dangerous. Cars can leave the track, hit barriers or each other, catch fire or shed parts, and people on track, in the pit lane and in the paddock can be badly hurt or killed.
2. I will drive only a car that has been cleared at scrutineering for the class it runs in, wearing the helmet and clothing the rules require, and I will follow every instruction of the clerk of course, the marshals and the scrutineers at once.
3. I declare that I am fit to drive, that I hold the licence the event requires, and that what I have told the organizers about my car and myself is true.
4. I accept that the organizers, the club, the venue, the officials and the marshals are not liable to me for loss, damage or injury, except where the law does not allow that liability to be excluded.
5. I will tell the organizers at once of anything that may affect my fitness to drive or the safety of my car.

I have read this in full, understood it, and accept it by typing my full name.`;
